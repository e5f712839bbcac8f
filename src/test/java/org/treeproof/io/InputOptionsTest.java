package org.treeproof.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.treeproof.cli.InputOptions;
import org.treeproof.data.InputException;
import org.treeproof.data.MissingPolicy;
import org.treeproof.data.Preparation;
import org.treeproof.data.PreparationReport;
import org.treeproof.data.Scale;
import picocli.CommandLine;

/** The input options as the command line parses them, and loading through them. */
class InputOptionsTest {

    private static Path input(String name) throws URISyntaxException {
        return Path.of(InputOptionsTest.class.getResource("/input/" + name).toURI());
    }

    private static String refusal(String args) {
        return assertThrows(CommandLine.ParameterException.class, () -> OptionsProbe.parse(args)).getMessage();
    }

    @Test
    void defaults() {
        InputOptions o = OptionsProbe.parse("");
        assertEquals(new Preparation(MissingPolicy.ERROR, false, Scale.ZSCORE, 0), o.preparation());
        assertEquals(Preparation.defaults(), o.preparation());
        assertEquals(Optional.empty(), o.delimiter());
        assertFalse(o.samplesInColumns());
        assertFalse(o.distances());
    }

    @Test
    void everyOption() {
        InputOptions o = OptionsProbe.parse("--samples-in-columns --delimiter ; --missing impute-median --log2"
                + " --scale center --top-variable 50");
        assertEquals(new Preparation(MissingPolicy.IMPUTE_MEDIAN, true, Scale.CENTER, 50), o.preparation());
        assertEquals(Optional.of(';'), o.delimiter());
        assertTrue(o.samplesInColumns());
    }

    @Test
    void delimiterNames() {
        String[][] cases = {{",", ","}, {";", ";"}, {"|", "|"}, {"tab", "\t"}, {"TAB", "\t"}, {"\\t", "\t"},
            {"\t", "\t"}, {"comma", ","}, {"semicolon", ";"}, {"space", " "}, {"pipe", "|"}, {":", ":"}};
        for (String[] c : cases) {
            InputOptions o = parseOne("--delimiter", c[0]);
            assertEquals(Optional.of(c[1].charAt(0)), o.delimiter(), "--delimiter " + c[0]);
        }
    }

    private static InputOptions parseOne(String option, String value) {
        OptionsProbe probe = new OptionsProbe();
        new CommandLine(probe).parseArgs(option, value);
        return probe.input;
    }

    @Test
    void badValuesAreRefusedNamingTheOption() {
        List<String> messages = List.of(refusal("--delimiter ab"),
                assertThrows(CommandLine.ParameterException.class, () -> parseOne("--delimiter", "\"")).getMessage(),
                refusal("--missing fill"), refusal("--scale unit"), refusal("--top-variable -5"),
                refusal("--top-variable many"));
        String[][] expected = {{"'--delimiter'", "'ab' is not one character"}, {"'--delimiter'", "quote character"},
            {"'--missing'", "unknown missing-value policy 'fill'; use one of error, drop-features, drop-samples,"
                + " impute-median"}, {"'--scale'", "unknown scaling 'unit'; use one of none, center, zscore, robust"},
            {"'--top-variable'", "'-5' is negative"}, {"'--top-variable'", "'many' is not a whole number"}};
        for (int k = 0; k < expected.length; k++) {
            String m = messages.get(k);
            assertTrue(m.contains(expected[k][0]) && m.contains(expected[k][1]), m);
            assertFalse(m.contains("\n"), m);
        }
    }

    @Test
    void userNamesIgnoreCaseAndTakeAliases() {
        assertEquals(MissingPolicy.IMPUTE_MEDIAN, OptionsProbe.parse("--missing IMPUTE_MEDIAN").preparation().missing());
        assertEquals(Scale.CENTER, OptionsProbe.parse("--scale centre").preparation().scale());
        assertEquals(Scale.ZSCORE, OptionsProbe.parse("--scale z-score").preparation().scale());
        assertEquals(Scale.NONE, OptionsProbe.parse("--scale None").preparation().scale());
    }

    @Test
    void loadsAndPreparesADataTable() throws Exception {
        Path file = input("plain.csv");
        LoadedInput in = OptionsProbe.parse("--missing impute-median --scale none --top-variable 2").load(file);
        assertFalse(in.isDistanceTable());
        assertEquals(file.toString(), in.source().path());
        assertEquals(3, in.inputSamples());
        assertEquals(3, in.inputFeatures());
        assertEquals(List.of("S1", "S2", "S3, rep"), in.sampleIds());
        // G2 gets the median of 2 and 8 = 5; variances (population): G1 {1.5,4,7} 5.0556, G2 {2,5,8} 6,
        // G3 {-3,0.6,9.25} 26.42, so the top 2 are G2 and G3, in input order.
        assertEquals(List.of("G2", "G3"), in.matrix().orElseThrow().featureNames());
        assertEquals(5.0, in.matrix().orElseThrow().get(1, 0));
        PreparationReport r = in.preparation().orElseThrow();
        assertEquals(1, r.imputedCells());
        assertEquals(2, in.features());
        assertEquals(Optional.empty(), in.distances());
    }

    @Test
    void loadsADistanceTable() throws Exception {
        LoadedInput in = OptionsProbe.parse("--distances").load(input("distances/iris-head-euclidean.csv"));
        assertTrue(in.isDistanceTable());
        assertEquals(12, in.samples());
        assertEquals(0, in.features());
        assertEquals(0, in.inputFeatures());
        assertEquals(Optional.empty(), in.preparation());
        assertEquals(12, in.distances().orElseThrow().size());
    }

    @Test
    void dataOptionsWithDistancesAreRefusedTogether() throws Exception {
        InputException e = assertThrows(InputException.class, () -> OptionsProbe.parse(
                "--distances --samples-in-columns --missing error --top-variable 3")
                .load(input("distances/iris-head-euclidean.csv")));
        assertEquals("--samples-in-columns, --missing, --top-variable do not apply to a distance table (--distances)",
                e.getMessage());
    }

    @Test
    void helpListsEveryInputOption() {
        String usage = new CommandLine(new OptionsProbe()).getUsageMessage();
        for (String option : List.of("--samples-in-columns", "--delimiter", "--missing", "--log2", "--scale",
                "--top-variable", "--distances")) {
            assertTrue(usage.contains(option), option);
        }
        assertTrue(usage.contains("Default: zscore"), usage);
    }
}
