package org.treeproof.judgement;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * The judgement suite as a test: every case of {@link JudgementCases} through the shaded jar with default options;
 * prints the table (also written to {@code target/judgement/table.txt}) and fails naming every wrong case.
 *
 * <p>Tagged {@code judgement}: the pom's {@code excludedTestGroups} property switches it on or off for
 * {@code mvn -B verify} in one place. {@code -Djudgement.only=REGEX} runs only the matching cases,
 * {@code -Djudgement.draw=D} judges fresh synthetic data (another draw of the same kinds).
 */
@Tag("judgement")
class JudgementIT {
    /**
     * Cases the current rule is known to get wrong, each with why. The test fails on any other wrong case, and also
     * when one of these becomes right (so the list stays true). Empty since the separation condition (a dip in
     * density between each cluster and its nearest), which the curved chain's pieces fail; the chain was listed
     * here before it.
     */
    static final java.util.Map<String, String> KNOWN_WRONG = java.util.Map.of();

    @Test
    void everyCaseGetsAnAcceptedAnswer() throws Exception {
        String jar = System.getProperty("treeproof.jar", "target/treeproof.jar");
        Path work = Path.of(jar).toAbsolutePath().getParent().resolve("judgement");
        String only = System.getProperty("judgement.only", "");
        int draw = Integer.getInteger("judgement.draw", 0);
        var suite = new JudgementSuite(Path.of(jar), work,
                List.of("-Xmx" + System.getProperty("judgement.xmx", "3g")), draw);
        System.out.println(JudgementSuite.header());
        List<JudgementSuite.Outcome> outcomes = suite.run(only.isEmpty() ? null : Pattern.compile(only), System.out);
        String table = JudgementSuite.table(outcomes);
        Files.writeString(work.resolve("table.txt"), table, StandardCharsets.UTF_8);
        System.out.print(table);
        String wrong = outcomes.stream().filter(o -> !o.right() && !KNOWN_WRONG.containsKey(o.c().name()))
                .map(o -> o.c().name() + " (" + o.why() + ")").collect(Collectors.joining("; "));
        String nowRight = outcomes.stream().filter(o -> o.right() && KNOWN_WRONG.containsKey(o.c().name()))
                .map(o -> o.c().name()).collect(Collectors.joining(", "));
        assertTrue(!outcomes.isEmpty(), "no case matched judgement.only=" + only);
        assertTrue(wrong.isEmpty(), "wrong answers: " + wrong + "\n" + table);
        // the list is of draw 0, the suite; on another draw a listed synthetic case is fresh data and may come out right
        assertTrue(draw != 0 || nowRight.isEmpty(), "now right, take off KNOWN_WRONG: " + nowRight + "\n" + table);
    }
}
