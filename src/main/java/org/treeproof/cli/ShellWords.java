package org.treeproof.cli;

import java.util.regex.Pattern;
import java.util.stream.Collectors;
import java.util.stream.Stream;

/**
 * A command line written so it can be pasted back into a POSIX shell (sh, bash, zsh): words made only of
 * characters no shell treats specially stay as they are, every other word is put in single quotes (a single quote
 * inside becomes {@code '\''}), as POSIX.1-2017, Shell Command Language, section 2.2.3 defines single quoting.
 */
final class ShellWords {
    private static final Pattern PLAIN = Pattern.compile("[A-Za-z0-9_./:,+@%-]+");

    private ShellWords() {
    }

    /** One word, quoted if a shell would otherwise split or expand it. */
    static String quote(String word) {
        if (!word.isEmpty() && PLAIN.matcher(word).matches()) {
            return word;
        }
        return "'" + word.replace("'", "'\\''") + "'";
    }

    /** The words joined by spaces, each quoted as needed. */
    static String join(String... words) {
        return Stream.of(words).map(ShellWords::quote).collect(Collectors.joining(" "));
    }
}
