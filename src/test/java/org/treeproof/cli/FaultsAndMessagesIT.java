package org.treeproof.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.jsoup.Jsoup;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * From the jar: faults of the machine (full disk, Ctrl-C), the permissions of what is written, the command-line
 * texts, and the demo's input folder. Each failure is one line with exit 2 (130 on Ctrl-C) and says what was kept.
 */
class FaultsAndMessagesIT {
    private static final Path BASIC = Path.of("src/test/resources/cli/basic.csv").toAbsolutePath();
    private static final String[] QUICK = {"--no-progress", "--replicates", "30", "--null-sets", "2",
        "--null-replicates", "3", "--reference-sets", "0", "--max-k", "4"};

    @TempDir
    Path tmp;

    private static String[] assess(String input, String out, String... extra) {
        var a = new ArrayList<>(List.of("assess", input, "--out", out));
        a.addAll(List.of(QUICK));
        a.addAll(List.of(extra));
        return a.toArray(String[]::new);
    }

    private List<String> listing() throws IOException {
        try (Stream<Path> s = Files.list(tmp)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    private static void oneLine(Jar.Result r, int exit, String expected) {
        assertEquals(exit, r.exit(), r.err());
        List<String> lines = r.err().strip().lines().toList();
        assertEquals(1, lines.size(), r.err());
        assertTrue(lines.get(0).contains(expected), () -> "expected '" + expected + "' in " + lines.get(0));
        assertFalse(r.err().contains("Exception"), r.err());
    }

    @Test
    void aFullDiskWhileWritingTheResultsKeepsTheStudyForResume() throws Exception {
        Files.copy(BASIC, tmp.resolve("data.csv"));
        Jar.Result r = Jar.run(tmp, List.of("-Dtreeproof.faultNoSpace=results"), assess("data.csv", "r"));
        oneLine(r, 2, "no space left on device while writing the results for --out r; nothing was written under r, "
                + "and the finished study is kept in ");
        assertTrue(r.err().contains("--resume"), r.err());
        assertEquals(List.of(".r.checkpoint", "data.csv"), listing(), "no output, no staging, the checkpoint kept");
        Jar.Result resumed = Jar.run(tmp, assess("data.csv", "r", "--resume"));
        assertEquals(0, resumed.exit(), resumed.err());
        assertTrue(resumed.err().contains("resuming with 30 replicates"), resumed.err());
        assertEquals(List.of("data.csv", "r"), listing());
    }

    @Test
    void keptWorkDiscardedOrNotFoundIsSaid() throws Exception {
        Files.copy(BASIC, tmp.resolve("data.csv"));
        Jar.Result none = Jar.run(tmp, assess("data.csv", "r", "--resume"));
        assertEquals(0, none.exit(), none.err());
        assertTrue(none.err().contains("--resume: no interrupted run of this study was found beside --out; starting "
                + "afresh"), none.err());
        Jar.Result r = Jar.run(tmp, List.of("-Dtreeproof.faultNoSpace=results"), assess("data.csv", "again"));
        assertEquals(2, r.exit(), r.err());
        Jar.Result fresh = Jar.run(tmp, assess("data.csv", "again"));
        assertEquals(0, fresh.exit(), fresh.err());
        assertTrue(fresh.err().contains("note: the work an interrupted run kept beside --out was discarded"),
                fresh.err());
    }

    @Test
    void aFullDiskWhileKeepingTheCheckpointSaysHowMuchWasKept() throws Exception {
        Files.copy(BASIC, tmp.resolve("data.csv"));
        Jar.Result r = Jar.run(tmp, List.of("-Dtreeproof.faultNoSpace=checkpoint:7"), assess("data.csv", "r"));
        oneLine(r, 2, "no space left on device while keeping the checkpoint beside --out r; nothing was written under "
                + "r, and 7 finished pieces of work are kept in ");
        assertEquals(List.of(".r.checkpoint", "data.csv"), listing());
    }

    @Test
    void aFullDiskBeforeAnythingFinishedLeavesNoCheckpoint() throws Exception {
        Files.copy(BASIC, tmp.resolve("data.csv"));
        Jar.Result r = Jar.run(tmp, List.of("-Dtreeproof.faultNoSpace=checkpoint:0"), assess("data.csv", "r"));
        oneLine(r, 2, "no space left on device while keeping the checkpoint beside --out r; nothing was kept");
        assertEquals(List.of("data.csv"), listing());
    }

    /** SIGINT is what Ctrl-C sends; a process started with SIGINT ignored (no job control) gets SIGTERM instead. */
    @Test
    void ctrlCSaysTheFinishedWorkIsKeptAndResumeContinuesIt() throws Exception {
        var sb = new StringBuilder("id");
        for (int j = 0; j < 10; j++) {
            sb.append(",f").append(j);
        }
        sb.append('\n');
        var rng = new java.util.SplittableRandom(9);
        for (int i = 0; i < 300; i++) {
            sb.append('s').append(i);
            for (int j = 0; j < 10; j++) {
                sb.append(',').append(rng.nextGaussian() + i % 3);
            }
            sb.append('\n');
        }
        Files.writeString(tmp.resolve("data.csv"), sb);
        boolean intIgnored = sigintIgnoredHere();
        var cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-jar",
                Jar.path().toAbsolutePath().toString(), "assess", "data.csv", "--out", "r", "--replicates", "10000",
                "--null-sets", "0", "--reference-sets", "0"));
        Path err = tmp.resolve("err.txt");
        Process p = new ProcessBuilder(cmd).directory(tmp.toFile()).redirectError(err.toFile())
                .redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        // wait until some replicates are finished (the progress lines say so)
        long deadline = System.nanoTime() + TimeUnit.MINUTES.toNanos(3);
        while (!Files.readString(err).matches("(?s).*replicates: [1-9][0-9]*/10000.*") && System.nanoTime() < deadline
                && p.isAlive()) {
            Thread.sleep(200);
        }
        new ProcessBuilder("kill", intIgnored ? "-TERM" : "-INT", Long.toString(p.pid())).start().waitFor();
        assertTrue(p.waitFor(2, TimeUnit.MINUTES), "stopped");
        String text = Files.readString(err, StandardCharsets.UTF_8);
        assertEquals(intIgnored ? 143 : 130, p.exitValue(), text);
        assertTrue(text.contains("treeproof: interrupted; the finished work ("), text);
        assertTrue(text.contains("is kept in " + tmp.resolve(".r.checkpoint").toRealPath()
                + ": run the same command with --resume to continue")
                || text.contains("is kept in " + tmp.resolve(".r.checkpoint")), text);
        assertTrue(Files.isDirectory(tmp.resolve(".r.checkpoint")));
        assertFalse(Files.exists(tmp.resolve("r")));
    }

    private static boolean sigintIgnoredHere() throws IOException {
        // children inherit ignored signals; SigIgn is a hex mask with bit (signal - 1)
        for (String line : Files.readAllLines(Path.of("/proc/self/status"))) {
            if (line.startsWith("SigIgn:")) {
                return (Long.parseLong(line.substring(7).strip(), 16) & (1L << 1)) != 0;
            }
        }
        return false;
    }

    private Jar.Result underUmask(String umask, String... args) throws Exception {
        var cmd = new StringBuilder("umask " + umask + " && exec '" + Path.of(System.getProperty("java.home"), "bin",
                "java") + "' -jar '" + Jar.path().toAbsolutePath() + "'");
        for (String a : args) {
            cmd.append(" '").append(a).append('\'');
        }
        Process p = new ProcessBuilder("sh", "-c", cmd.toString()).directory(tmp.toFile())
                .redirectOutput(ProcessBuilder.Redirect.DISCARD).redirectErrorStream(false).start();
        String err = new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(5, TimeUnit.MINUTES));
        return new Jar.Result(p.exitValue(), "", err);
    }

    @Test
    void theOutputFollowsTheUmask() throws Exception {
        Files.copy(BASIC, tmp.resolve("data.csv"));
        Jar.Result shared = underUmask("022", assess("data.csv", "shared"));
        assertEquals(0, shared.exit(), shared.err());
        assertEquals("rwxr-xr-x", PosixFilePermissions.toString(Files.getPosixFilePermissions(tmp.resolve("shared"))));
        assertEquals("rw-r--r--", PosixFilePermissions.toString(
                Files.getPosixFilePermissions(tmp.resolve("shared/report.html"))));
        assertEquals("rwxr-xr-x", PosixFilePermissions.toString(
                Files.getPosixFilePermissions(tmp.resolve("shared/charts"))));
        Jar.Result own = underUmask("077", assess("data.csv", "private"));
        assertEquals(0, own.exit(), own.err());
        assertEquals("rwx------", PosixFilePermissions.toString(Files.getPosixFilePermissions(tmp.resolve("private"))));
    }

    @Test
    void theReportsCommandLineCanBePastedBack() throws Exception {
        Files.copy(BASIC, tmp.resolve("my data.csv"));
        Jar.Result r = Jar.run(tmp, assess("my data.csv", "r"));
        assertEquals(0, r.exit(), r.err());
        String shown = Jsoup.parse(tmp.resolve("r/report.html").toFile(), "UTF-8").select("pre code").stream()
                .map(e -> e.text()).filter(t -> t.startsWith("treeproof ")).findFirst().orElseThrow();
        assertEquals("treeproof assess 'my data.csv' --out r " + String.join(" ", QUICK), shown);
    }

    @Test
    void idsThatArePlainNegativeNumbersStayAsTheyAre() throws Exception {
        var sb = new StringBuilder("id,a,b\n");
        var rng = new java.util.SplittableRandom(4);
        for (int i = 0; i < 24; i++) {
            String id = i == 0 ? "-5" : i == 1 ? "-2+3" : i == 2 ? "-0.25e3" : i == 3 ? "-A1" : "s" + i;
            double c = i % 2 == 0 ? 0 : 10;
            sb.append(id).append(',').append(c + rng.nextDouble()).append(',').append(rng.nextDouble()).append('\n');
        }
        Files.writeString(tmp.resolve("ids.csv"), sb);
        Jar.Result r = Jar.run(tmp, assess("ids.csv", "r"));
        assertEquals(0, r.exit(), r.err());
        List<String> ids = Files.readAllLines(tmp.resolve("r/clusters.csv")).stream().skip(1)
                .map(l -> l.substring(0, l.indexOf(','))).toList();
        assertTrue(ids.contains("-5") && ids.contains("-0.25e3"), ids.toString());
        assertTrue(ids.contains("'-2+3") && ids.contains("'-A1"), ids.toString());
    }

    @Test
    void withoutACommandTheUsageGoesToStderrWithExitTwo() throws Exception {
        Jar.Result r = Jar.run(tmp);
        assertEquals(2, r.exit());
        assertTrue(r.err().startsWith("Usage: treeproof"), r.err());
        assertEquals("", r.out());
    }

    @Test
    void anUnknownCommandPointsAtTheToolsHelp() throws Exception {
        Jar.Result r = Jar.run(tmp, "frobnicate");
        oneLine(r, 2, "(see 'treeproof --help')");
        Jar.Result sub = Jar.run(tmp, "assess", "--bogus");
        oneLine(sub, 2, "(see 'treeproof assess --help')");
    }

    @Test
    void standardInputAndPipesAreRefusedWithAReason() throws Exception {
        oneLine(Jar.run(tmp, "assess", "-", "--out", "r"), 2, "INPUT -: reading a table from standard input is not "
                + "supported");
        oneLine(Jar.run(tmp, "tree", "-"), 2, "INPUT -: reading a table from standard input is not supported");
        Path fifo = tmp.resolve("table.csv");
        assertEquals(0, new ProcessBuilder("mkfifo", fifo.toString()).start().waitFor());
        oneLine(Jar.run(tmp, "assess", "table.csv", "--out", "r"), 2, "table.csv: is a pipe or device, not a regular "
                + "file");
        assertEquals(List.of("table.csv"), listing());
    }

    @Test
    void demoRefusesAnEmptyOutputNameAndLeavesNothing() throws Exception {
        Path work = Files.createDirectories(tmp.resolve("work"));
        Jar.Result r = Jar.run(work, "demo", "--out", "", "--no-progress");
        oneLine(r, 2, "--out: the directory name is empty");
        assertEquals(List.of("work"), listing());
        try (Stream<Path> s = Files.list(work)) {
            assertEquals(0, s.count());
        }
    }

    @Test
    void demoKeepsAnEditedInputTableAndAFileInTheWay() throws Exception {
        Path in = Files.createDirectories(tmp.resolve("treeproof-demo-input"));
        Files.writeString(in.resolve("yeast-batches.csv"), "my edited copy\n");
        Jar.Result r = Jar.run(tmp, "demo", "--no-progress");
        oneLine(r, 2, "holds yeast-batches.csv, which differs from the bundled table (edited?); it is kept");
        assertEquals("my edited copy\n", Files.readString(in.resolve("yeast-batches.csv")));
        assertEquals(List.of("treeproof-demo-input"), listing());

        Files.writeString(tmp.resolve("other-input"), "a file where the demo wants its folder");
        Jar.Result f = Jar.run(tmp, "demo", "--out", "other", "--no-progress");
        oneLine(f, 2, "the demo's input folder " + tmp.resolve("other-input") + " exists and is not a folder");
        assertEquals("a file where the demo wants its folder", Files.readString(tmp.resolve("other-input")));
    }

    @Test
    void aFailedDemoRemovesWhatItUnpacked() throws Exception {
        Jar.Result r = Jar.run(tmp, "demo", "--no-progress", "--threads", "0");
        assertEquals(2, r.exit(), r.err());
        assertTrue(r.err().contains("--threads must be between 1 and 1024"), r.err());
        assertEquals(List.of(), listing());
        Files.createDirectories(tmp.resolve("taken"));
        Jar.Result taken = Jar.run(tmp, "demo", "--out", "taken", "--no-progress");
        oneLine(taken, 2, "--out taken: already exists");
        assertEquals(List.of("taken"), listing());
    }
}
