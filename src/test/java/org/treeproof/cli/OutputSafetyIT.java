package org.treeproof.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * From the jar: {@code --force} replaces only a directory treeproof wrote, never the input's folder, the current
 * directory, a folder above it, the root or the home folder; every refusal is exit 2 and one line, before any
 * work, and every file in the working tree (input and unrelated files alike) survives byte for byte.
 */
class OutputSafetyIT {
    private static final Path BASIC = Path.of("src/test/resources/cli/basic.csv").toAbsolutePath();
    private static final String[] QUICK = {"--replicates", "10", "--null-sets", "0", "--reference-sets", "0",
        "--max-k", "4"};

    @TempDir
    Path tmp;

    /** Every file and link under {@code root} with its content, to prove nothing changed. */
    private static Map<String, String> snapshot(Path root) throws IOException {
        var out = new TreeMap<String, String>();
        try (Stream<Path> walk = Files.walk(root)) {
            for (Path p : (Iterable<Path>) walk::iterator) {
                String rel = root.relativize(p).toString();
                if (Files.isSymbolicLink(p)) {
                    out.put(rel, "-> " + Files.readSymbolicLink(p));
                } else if (Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS)) {
                    out.put(rel, java.util.HexFormat.of().formatHex(java.security.MessageDigest
                            .getInstance("SHA-256").digest(Files.readAllBytes(p))));
                } else {
                    out.put(rel, "dir");
                }
            }
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
        return out;
    }

    private static String[] args(String input, String out, String... extra) {
        var a = new ArrayList<>(List.of("assess", input, "--out", out));
        a.addAll(List.of(QUICK));
        a.addAll(List.of(extra));
        return a.toArray(String[]::new);
    }

    /** Runs a command that must be refused: exit 2, one line holding {@code expected}, the tree unchanged. */
    private void refused(Path cwd, List<String> jvm, String expected, String... args) throws Exception {
        Map<String, String> before = snapshot(tmp);
        Jar.Result r = Jar.run(cwd, jvm, args);
        assertEquals(2, r.exit(), r.err());
        List<String> lines = r.err().strip().lines().toList();
        // progress is printed to stderr when it is not a terminal: one line proves no stage started
        assertEquals(1, lines.size(), () -> "one line, no progress, got:\n" + r.err());
        assertTrue(lines.get(0).contains(expected), () -> "expected '" + expected + "' in " + lines.get(0));
        assertFalse(r.err().contains("Exception"), r.err());
        assertEquals(before, snapshot(tmp), "every file survives, nothing is added");
    }

    private Path workWithInput() throws IOException {
        Path work = Files.createDirectories(tmp.resolve("work"));
        Files.copy(BASIC, work.resolve("data.csv"));
        Files.writeString(work.resolve("notes.txt"), "unrelated notes");
        Files.writeString(tmp.resolve("elsewhere.txt"), "unrelated, one level up");
        return work;
    }

    @Test
    void forceNeverReplacesTheCurrentDirectory() throws Exception {
        Path work = workWithInput();
        refused(work, List.of(), "--out .: is the current directory", args("data.csv", ".", "--force"));
    }

    @Test
    void forceNeverReplacesAFolderAboveTheCurrentDirectory() throws Exception {
        Path work = workWithInput();
        refused(work, List.of(), "--out ..: holds the current directory", args("data.csv", "..", "--force"));
    }

    @Test
    void forceNeverReplacesTheFolderHoldingTheInput() throws Exception {
        workWithInput();
        refused(tmp, List.of(), "--out work: holds the input file work/data.csv",
                args("work/data.csv", "work", "--force"));
    }

    @Test
    void forceNeverReplacesTheFolderHoldingTheLabels() throws Exception {
        workWithInput();
        Path labelsDir = Files.createDirectories(tmp.resolve("classes"));
        var sb = new StringBuilder("id,class\n");
        for (int i = 0; i < 24; i++) {
            sb.append(String.format("s%02d,c%d%n", i, i % 2));
        }
        Files.writeString(labelsDir.resolve("truth.csv"), sb);
        refused(tmp, List.of(), "--out classes: holds the input file classes/truth.csv",
                args("work/data.csv", "classes", "--force", "--labels", "classes/truth.csv"));
    }

    @Test
    void forceNeverReplacesAFolderTreeproofDidNotWrite() throws Exception {
        workWithInput();
        Path other = Files.createDirectories(tmp.resolve("project/figures"));
        Files.writeString(other.resolve("draft.txt"), "a user's file");
        refused(tmp, List.of(), "--out project: was not written by treeproof",
                args("work/data.csv", "project", "--force"));
    }

    @Test
    void forceNeverReplacesTheRootOrTheHomeFolder() throws Exception {
        workWithInput();
        refused(tmp, List.of(), "--out /: is the root folder", args("work/data.csv", "/", "--force"));
        // a home folder that even looks like treeproof output is refused
        Path home = tmp.resolve("home");
        Jar.Result first = Jar.run(tmp, args("work/data.csv", "home", "--no-progress"));
        assertEquals(0, first.exit(), first.err());
        refused(tmp, List.of("-Duser.home=" + home), "--out home: is the home folder",
                args("work/data.csv", "home", "--force"));
    }

    @Test
    void theCurrentDirectoryIsKeptEvenWhenTreeproofWroteIt() throws Exception {
        workWithInput();
        Jar.Result first = Jar.run(tmp, args("work/data.csv", "r", "--no-progress"));
        assertEquals(0, first.exit(), first.err());
        refused(tmp.resolve("r"), List.of(), "--out .: is the current directory",
                args(tmp.resolve("work/data.csv").toString(), ".", "--force"));
    }

    @Test
    void forceReplacesTreeproofsOwnOutputButNothingAUserAdded() throws Exception {
        workWithInput();
        Jar.Result first = Jar.run(tmp, args("work/data.csv", "r", "--no-progress"));
        assertEquals(0, first.exit(), first.err());
        assertTrue(Files.isRegularFile(tmp.resolve("r/.treeproof-output")), "the output carries its manifest");

        Jar.Result again = Jar.run(tmp, args("work/data.csv", "r", "--no-progress", "--force", "--seed", "2"));
        assertEquals(0, again.exit(), again.err());
        assertTrue(Files.readString(tmp.resolve("r/summary.json")).contains("\"seed\" : 2"), "replaced");

        Files.writeString(tmp.resolve("r/my-notes.txt"), "written by the user");
        refused(tmp, List.of(), "--out r: holds my-notes.txt, which treeproof did not write",
                args("work/data.csv", "r", "--force"));
        Files.delete(tmp.resolve("r/my-notes.txt"));

        Files.writeString(tmp.resolve("r/methods.md"), "\nedited by the user\n",
                java.nio.file.StandardOpenOption.APPEND);
        refused(tmp, List.of(), "--out r: methods.md was changed after treeproof wrote it",
                args("work/data.csv", "r", "--force"));

        Files.createDirectories(tmp.resolve("r/extra"));
        Files.writeString(tmp.resolve("elsewhere2.txt"), "x");
        Files.createSymbolicLink(tmp.resolve("r/link"), tmp.resolve("elsewhere2.txt"));
        refused(tmp, List.of(), "--out r: ", args("work/data.csv", "r", "--force"));
    }

    @Test
    void aFileAsOutputIsRefusedBeforeAnyWork() throws Exception {
        workWithInput();
        Files.writeString(tmp.resolve("out.txt"), "a file, not a folder");
        // without --no-progress: progress lines would show on stderr if any stage ran
        refused(tmp, List.of(), "--out out.txt: exists and is not a directory",
                "assess", "work/data.csv", "--out", "out.txt", "--force");
    }

    @Test
    void aSymbolicLinkAsOutputIsRefusedBeforeAnyWork() throws Exception {
        workWithInput();
        Files.createSymbolicLink(tmp.resolve("dangling"), tmp.resolve("nowhere"));
        refused(tmp, List.of(), "--out dangling: is a symbolic link to nothing",
                "assess", "work/data.csv", "--out", "dangling");
        Files.createDirectories(tmp.resolve("real"));
        Files.createSymbolicLink(tmp.resolve("link"), tmp.resolve("real"));
        refused(tmp, List.of(), "--out link: is a symbolic link", "assess", "work/data.csv", "--out", "link",
                "--force");
    }
}
