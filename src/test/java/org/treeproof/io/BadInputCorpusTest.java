package org.treeproof.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.treeproof.data.InputException;

/**
 * Every file of {@code src/test/resources/bad-input/} is refused through the input options exactly as the command
 * line would refuse it, with the one-line message written beside it in {@code expected-messages.tsv}. The
 * expected messages are hand-written from the files (line and column counted by hand, header = line 1); the
 * binary files come from {@code make-binary-cases.py} in the same directory.
 */
class BadInputCorpusTest {

    record Case(String file, String args, String expected) {
        @Override
        public String toString() {
            return file + (args.isEmpty() ? "" : " " + args);
        }
    }

    static Path dir() throws URISyntaxException {
        return Path.of(BadInputCorpusTest.class.getResource("/bad-input/expected-messages.tsv").toURI()).getParent();
    }

    static List<Case> cases() throws IOException, URISyntaxException {
        return Files.readAllLines(dir().resolve("expected-messages.tsv"), StandardCharsets.UTF_8).stream()
                .filter(l -> !l.isBlank() && !l.startsWith("#"))
                .map(l -> {
                    String[] f = l.split("\t", -1);
                    assertEquals(3, f.length, "malformed line in expected-messages.tsv: " + l);
                    return new Case(f[0], f[1], f[2]);
                })
                .collect(Collectors.toList());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void refusedWithItsMessage(Case c) throws URISyntaxException {
        Path file = dir().resolve(c.file());
        assertTrue(Files.isRegularFile(file), "missing corpus file " + c.file());
        InputException e = assertThrows(InputException.class, () -> OptionsProbe.parse(c.args()).load(file));
        String message = e.getMessage();
        assertTrue(message.contains(c.expected()), () -> "expected\n  " + c.expected() + "\nin\n  " + message);
        assertFalse(message.contains("\n") || message.contains("\r"), "one line: " + message);
        // Problems with the file name the file as the user gave it; option conflicts name the option first.
        assertTrue(message.startsWith(file.toString()) || message.startsWith("--"), message);
    }

    @Test
    void everyCorpusFileHasAnExpectedMessageAndThereAreAtLeastThirty() throws IOException, URISyntaxException {
        Set<String> listed = cases().stream().map(Case::file).collect(Collectors.toCollection(TreeSet::new));
        Set<String> present;
        try (Stream<Path> files = Files.list(dir())) {
            present = files.map(p -> p.getFileName().toString())
                    .filter(n -> !n.equals("expected-messages.tsv") && !n.equals("cli-cases.tsv") && !n.endsWith(".py") && !n.startsWith("."))
                    .collect(Collectors.toCollection(TreeSet::new));
        }
        assertEquals(present, listed);
        assertTrue(present.size() >= 30, "corpus has " + present.size() + " files");
    }
}
