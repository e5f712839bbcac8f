package org.treeproof.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Quoting follows POSIX single quoting; checked by round-tripping each quoted line through /bin/sh. */
class ShellWordsTest {
    @Test
    void plainWordsStayAndOthersAreSingleQuoted() {
        assertEquals("treeproof assess data.csv --out r", ShellWords.join("treeproof", "assess", "data.csv", "--out", "r"));
        assertEquals("'my data.csv' '' 'it'\\''s' '$HOME' 'a;b'", ShellWords.join("my data.csv", "", "it's", "$HOME", "a;b"));
    }

    @Test
    void aShellReadsBackTheSameWords() throws Exception {
        List<String> words = List.of("assess", "my data.csv", "it's", "$HOME", "a;b|c", "*", "tab\there", "\"q\"", "~", "=x", "^y", "--k=2");
        String line = ShellWords.join(words.toArray(String[]::new));
        Process p = new ProcessBuilder("sh", "-c", "for w in " + line + "; do printf '%s\\n' \"$w\"; done").start();
        String out = new String(p.getInputStream().readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        p.waitFor();
        assertEquals(words, out.lines().toList());
    }
}
