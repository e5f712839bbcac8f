package org.treeproof.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/** Runs the shaded jar in a fresh JVM, as a user would, and captures what it printed. */
final class Jar {
    record Result(int exit, String out, String err) {
    }

    private Jar() {
    }

    static Path path() {
        String p = System.getProperty("treeproof.jar", "target/treeproof.jar");
        Path jar = Path.of(p);
        if (!Files.isRegularFile(jar)) {
            throw new IllegalStateException("build the jar first (mvn package): " + jar);
        }
        return jar;
    }

    static Result run(Path cwd, List<String> jvmOptions, String... args) throws IOException, InterruptedException {
        var cmd = new ArrayList<String>();
        cmd.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        cmd.add("-Xmx1g");
        cmd.addAll(jvmOptions);
        cmd.add("-jar");
        cmd.add(path().toAbsolutePath().toString());
        cmd.addAll(List.of(args));
        Path out = Files.createTempFile("treeproof-out", ".txt");
        Path err = Files.createTempFile("treeproof-err", ".txt");
        try {
            Process p = new ProcessBuilder(cmd).directory(cwd.toFile()).redirectOutput(out.toFile())
                    .redirectError(err.toFile()).start();
            if (!p.waitFor(10, TimeUnit.MINUTES)) {
                p.destroyForcibly();
                throw new IllegalStateException("timed out: " + cmd);
            }
            return new Result(p.exitValue(), Files.readString(out, StandardCharsets.UTF_8),
                    Files.readString(err, StandardCharsets.UTF_8));
        } finally {
            Files.deleteIfExists(out);
            Files.deleteIfExists(err);
        }
    }

    static Result run(Path cwd, String... args) throws IOException, InterruptedException {
        return run(cwd, List.of(), args);
    }
}
