package org.treeproof.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code assess --engine spark} as {@code spark-submit} runs it (a JVM whose Spark configuration arrives as
 * {@code spark.*} system properties) writes the summary.json of {@code --engine local}; without a master, or with an
 * unknown engine, it stops with one line and exit code 2.
 */
class EngineOptionTest {

    record Outcome(int exit, String stderr) {
    }

    private static Outcome treeproof(List<String> jvmOptions, String... args) throws IOException, InterruptedException {
        var command = new ArrayList<String>();
        command.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        command.add("-Xmx512m");
        command.addAll(jvmOptions);
        command.add("-cp");
        command.add(System.getProperty("java.class.path"));
        command.add(Main.class.getName());
        command.addAll(List.of(args));
        Process p = new ProcessBuilder(command).redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        String err = new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(120, TimeUnit.SECONDS), "treeproof did not finish");
        return new Outcome(p.exitValue(), err);
    }

    /** Three separated groups of 12 samples in 4 features. */
    private static Path table(Path dir) throws IOException {
        var rng = new SplittableRandom(5);
        var sb = new StringBuilder("sample,a,b,c,d\n");
        for (int i = 0; i < 36; i++) {
            sb.append("s").append(i);
            for (int j = 0; j < 4; j++) {
                sb.append(String.format(Locale.ROOT, ",%.6f", (j == i % 3 ? 7 : 0) + rng.nextGaussian()));
            }
            sb.append('\n');
        }
        Path f = dir.resolve("groups.csv");
        Files.writeString(f, sb);
        return f;
    }

    @Test
    void sparkWritesTheSummaryOfTheLocalEngine(@TempDir Path dir) throws Exception {
        Path in = table(dir);
        String[] study = {"--replicates", "16", "--null-sets", "3", "--null-replicates", "4", "--reference-sets", "4",
            "--linkages", "average,ward", "--max-k", "5", "--no-progress", "--threads", "2"};
        var local = new ArrayList<>(List.of("assess", in.toString(), "--out", dir.resolve("local").toString()));
        local.addAll(List.of(study));
        assertEquals(0, treeproof(List.of(), local.toArray(String[]::new)).exit());

        var spark = new ArrayList<>(List.of("assess", in.toString(), "--out", dir.resolve("spark").toString(),
                "--engine", "spark"));
        spark.addAll(List.of(study));
        Outcome run = treeproof(List.of("-Dspark.master=local[2]", "-Dspark.driver.host=127.0.0.1",
                "-Dspark.driver.bindAddress=127.0.0.1", "-Dspark.ui.enabled=false"), spark.toArray(String[]::new));
        assertEquals(0, run.exit(), run.stderr());
        assertTrue(run.stderr().contains("treeproof: replicates run on Spark (local[2], 2 cores)"), run.stderr());
        assertArrayEquals(Files.readAllBytes(dir.resolve("local/summary.json")),
                Files.readAllBytes(dir.resolve("spark/summary.json")));
        assertArrayEquals(Files.readAllBytes(dir.resolve("local/clusters.csv")),
                Files.readAllBytes(dir.resolve("spark/clusters.csv")));
    }

    @Test
    void withoutAMasterOrWithAnUnknownEngineItSaysSoInOneLine(@TempDir Path dir) throws Exception {
        Path in = table(dir);
        Outcome noMaster = treeproof(List.of(), "assess", in.toString(), "--out", dir.resolve("a").toString(),
                "--engine", "spark");
        assertEquals(2, noMaster.exit(), noMaster.stderr());
        assertTrue(noMaster.stderr().startsWith("treeproof: --engine spark: no Spark master is configured"),
                noMaster.stderr());
        assertEquals(1, noMaster.stderr().strip().lines().count(), noMaster.stderr());

        Outcome unknown = treeproof(List.of(), "assess", in.toString(), "--out", dir.resolve("b").toString(),
                "--engine", "hadoop");
        assertEquals(2, unknown.exit());
        assertEquals("treeproof: --engine: unknown engine 'hadoop'; expected local or spark", unknown.stderr().strip());
    }
}
