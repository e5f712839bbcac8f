package org.treeproof.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.treeproof.data.LibrarySize;
import org.treeproof.data.MissingPolicy;
import org.treeproof.data.Preparation;
import org.treeproof.data.Scale;
import org.treeproof.io.DataTable;
import org.treeproof.io.DataTableReader;
import org.treeproof.io.LoadedInput;

/** The preparation's notes on counts of uneven depth and on skewed features, worded for the options given. */
class PreparationNotesTest {
    @TempDir
    Path tmp;

    private LoadedInput load(String csv, Preparation p) throws IOException {
        Path f = Files.writeString(tmp.resolve("t.csv"), csv);
        DataTable t = new DataTableReader(null, false, false).read(f);
        return LoadedInput.of(t, p.apply(t.matrix(), t.locator()));
    }

    private static Preparation log2(MissingPolicy m, LibrarySize l) {
        return new Preparation(m, l, true, Scale.ZSCORE, 0);
    }

    @Test
    void unevenTotalsOfCountsAreNotedWithTheirRange() throws IOException {
        // totals 30, 60 and 61: 61 / 30 = 2.03 >= 2
        String csv = "id,a,b,c\ns1,10,10,10\ns2,20,20,20\ns3,20,20,21\n";
        List<String> n = StudyOutputs.unevenDepthNote(load(csv, log2(MissingPolicy.ERROR, LibrarySize.NONE)));
        assertEquals(List.of("Note: the samples' totals range from 30 ('s1') to 61 ('s3'), 2.0 times as much. If "
                + "these are read counts, samples read more deeply have larger counts on every feature and can cluster "
                + "by depth; --library-size median-ratio (or total) divides each sample by its size factor before "
                + "log2."), n);
        assertEquals(List.of(), StudyOutputs.unevenDepthNote(load(csv, log2(MissingPolicy.ERROR,
                LibrarySize.MEDIAN_RATIO))));
    }

    @Test
    void theNoteSurvivesImputedMediansThatAreNotWholeNumbers() throws IOException {
        // c's observed values 10 and 21 have the median 15.5, imputed into s2; the observed cells are counts
        String csv = "id,a,b,c\ns1,10,10,10\ns2,20,20,NA\ns3,40,40,21\n";
        List<String> n = StudyOutputs.unevenDepthNote(load(csv, log2(MissingPolicy.IMPUTE_MEDIAN, LibrarySize.NONE)));
        assertTrue(n.size() == 1 && n.get(0).startsWith("Note: the samples' totals range from 30 ('s1') to 101 ('s3')"),
                n.toString());
    }

    @Test
    void aSampleWithoutCountsIsNamedAsTheCause() throws IOException {
        String csv = "id,a,b,c\ns1,10,10,10\ns2,0,0,0\ns3,20,20,21\n";
        List<String> n = StudyOutputs.unevenDepthNote(load(csv, log2(MissingPolicy.ERROR, LibrarySize.NONE)));
        assertEquals(List.of("Note: sample 's2' has no counts (every value is 0) while others total up to 61 ('s3'). "
                + "If these are read counts, it carries no information; remove it, and if the other samples were read "
                + "to uneven depths, --library-size median-ratio (or total) divides each by its size factor before "
                + "log2."), n);
    }

    @Test
    void theSkewWarningDoesNotAdviseLog2WhenItWasTaken() throws IOException {
        // f1 is mostly 0 with one large value: skewed with or without the log
        var sb = new StringBuilder("id,f1,f2\n");
        for (int i = 0; i < 30; i++) {
            sb.append("s").append(i).append(',').append(i == 0 ? 1000 : 0).append(',').append(i % 7).append('\n');
        }
        String logged = StudyOutputs.skewWarning(load(sb.toString(), log2(MissingPolicy.ERROR, LibrarySize.NONE)))
                .get(0);
        assertTrue(logged.endsWith("these are skewed after log2 (--log2), so check them (a feature mostly at 0 is one "
                + "such) and consider leaving them out of the table."), logged);
        String raw = StudyOutputs.skewWarning(load(sb.toString(), new Preparation(MissingPolicy.ERROR, false,
                Scale.ZSCORE, 0))).get(0);
        assertTrue(raw.endsWith("a log transform (--log2) before scaling is the usual remedy."), raw);
    }
}
