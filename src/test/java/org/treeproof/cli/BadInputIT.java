package org.treeproof.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every malformed file of {@code src/test/resources/bad-input/} (with its expected message in
 * expected-messages.tsv) and every impossible option (cli-cases.tsv), run through the jar's {@code assess}:
 * exit 2, exactly one line on stderr holding the expected text, no stack trace, and no output directory.
 */
class BadInputIT {
    private static final Path DIR = Path.of("src/test/resources/bad-input").toAbsolutePath();

    record Case(String file, String options, String expected) {
        @Override
        public String toString() {
            return file + (options.isEmpty() ? "" : " " + options);
        }
    }

    static Stream<Case> cases() throws IOException {
        var out = new ArrayList<Case>();
        for (String table : List.of("expected-messages.tsv", "cli-cases.tsv")) {
            for (String line : Files.readAllLines(DIR.resolve(table), StandardCharsets.UTF_8)) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] f = line.split("\t", -1);
                out.add(new Case(f[0], f[1], f[2]));
            }
        }
        return out.stream();
    }

    @TempDir
    Path tmp;

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void refusedCleanly(Case c) throws Exception {
        var args = new ArrayList<>(List.of("assess", DIR.resolve(c.file()).normalize().toString(), "--out", "result",
                "--no-progress"));
        if (!c.options().isBlank()) {
            args.addAll(List.of(c.options().trim().split(" ")));
        }
        Jar.Result r = Jar.run(tmp, args.toArray(String[]::new));
        assertEquals(2, r.exit(), () -> "exit for " + c + ": " + r.err());
        List<String> lines = r.err().strip().lines().toList();
        assertEquals(1, lines.size(), () -> "one line on stderr, got:\n" + r.err());
        assertTrue(lines.get(0).contains(c.expected()), () -> "expected\n  " + c.expected() + "\nin\n  " + lines.get(0));
        assertFalse(r.err().contains("Exception") || r.err().contains("\tat "), r.err());
        try (var left = Files.list(tmp)) {
            assertEquals(List.of(), left.map(p -> p.getFileName().toString()).toList(), "nothing left behind");
        }
    }
}
