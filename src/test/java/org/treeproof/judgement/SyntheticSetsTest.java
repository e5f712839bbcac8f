package org.treeproof.judgement;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.judgement.Expected.NoStructure;
import org.treeproof.judgement.Expected.Structure;
import org.treeproof.judgement.JudgementSuite.Got;
import org.treeproof.tree.Linkage;

/**
 * The judgement suite's own parts, fast: the synthetic sets are reproducible and hold what their descriptions say,
 * the planted groups are recoverable (so "structure" is an honest expected answer), every case has its files, and
 * the judging and the adjusted Rand index behave on hand-built results.
 */
class SyntheticSetsTest {
    @Test
    void setsAreTheSameOnEveryCall() {
        assertEquals(SyntheticSets.all(), SyntheticSets.all());
    }

    @Test
    void anotherDrawIsFreshDataOfTheSameCases() {
        List<SyntheticSets.Set> suite = SyntheticSets.all();
        List<SyntheticSets.Set> other = SyntheticSets.all(1);
        assertEquals(suite.stream().map(SyntheticSets.Set::name).toList(),
                other.stream().map(SyntheticSets.Set::name).toList());
        for (int i = 0; i < suite.size(); i++) {
            assertFalse(suite.get(i).csv().equals(other.get(i).csv()), suite.get(i).name());
        }
    }

    @Test
    void everyCaseHasFilesAndAnExpectedAnswer() {
        var names = new HashSet<String>();
        for (JudgementCases.Case c : JudgementCases.all()) {
            assertTrue(names.add(c.name()), "duplicate case " + c.name());
            assertFalse(c.expected().reason().isBlank(), c.name());
            if (c.source() != JudgementCases.Source.SYNTHETIC) {
                var dir = c.source() == JudgementCases.Source.OPEN ? JudgementSuite.OPEN_DIR : JudgementSuite.FIXED_DIR;
                assertTrue(Files.isRegularFile(dir.resolve(c.file())), c.file());
                assertTrue(Files.isRegularFile(dir.resolve(c.truthFile())), c.truthFile());
            }
        }
        assertTrue(names.size() >= 25, "cases: " + names.size());
    }

    @Test
    void heavyTailedSetsHaveTheStatedShapes() {
        for (SyntheticSets.Set s : SyntheticSets.all()) {
            if (s.name().startsWith("heavy-tailed")) {
                double[][] x = rows(s);
                assertTrue(x.length >= 120 && x.length <= 220, s.name() + " n=" + x.length);
                assertTrue(x[0].length >= 5 && x[0].length <= 10, s.name() + " p=" + x[0].length);
            }
        }
    }

    @ParameterizedTest
    @ValueSource(ints = {0, 1, 2})
    void plantedGroupsAreRecoverableByWard(int draw) {
        // The expected answer "structure" is honest only if the groups are there to be found: Ward linkage on the
        // z-scored data (log2 first for counts), cut at the planted number of groups, agrees with the truth. Checked
        // for the suite's draw and two further draws, since the answers are meant to hold for any draw.
        int checked = 0;
        for (SyntheticSets.Set s : SyntheticSets.all(draw)) {
            JudgementCases.Case c = JudgementCases.all().stream().filter(x -> x.name().equals(s.name())).findFirst()
                    .orElseThrow();
            boolean structured = c.expected().answers().stream()
                    .anyMatch(a -> a instanceof Structure st && !Double.isNaN(st.minAri()));
            if (!structured || s.name().equals("parallel-bands")) {
                continue;
            }
            Map<String, String> truth = truth(s);
            double[][] x = s.name().startsWith("counts") ? log2Transposed(s) : rows(s);
            var keep = new ArrayList<Integer>();
            var ids = new ArrayList<>(truth.keySet());
            for (int i = 0; i < ids.size(); i++) {
                if (!truth.get(ids.get(i)).equals(SyntheticSets.FAR_POINT)) {
                    keep.add(i);
                }
            }
            double[][] kept = keep.stream().map(i -> x[i]).toArray(double[][]::new);
            List<String> planted = keep.stream().map(i -> truth.get(ids.get(i))).toList();
            int k = new HashSet<>(planted).size();
            int[] labels = Linkage.parse("ward").cluster(euclidean(zscore(kept))).cutLabelsAtK(k);
            List<String> found = java.util.Arrays.stream(labels).mapToObj(String::valueOf).toList();
            double ari = JudgementSuite.adjustedRand(planted, found);
            assertTrue(ari >= 0.9, s.name() + " (draw " + draw + "): Ward ARI " + ari);
            checked++;
        }
        assertTrue(checked >= 8, "checked " + checked);
    }

    @Test
    void adjustedRandMatchesScikitLearn() {
        // values from sklearn.metrics.adjusted_rand_score (scikit-learn 1.2.1)
        assertEquals(0.5714285714285714, JudgementSuite.adjustedRand(List.of("0", "0", "1", "1"),
                List.of("0", "0", "1", "2")), 1e-12);
        assertEquals(-0.5, JudgementSuite.adjustedRand(List.of("0", "0", "1", "1"), List.of("0", "1", "0", "1")),
                1e-12);
        assertEquals(0.35714285714285715, JudgementSuite.adjustedRand(
                List.of("0", "0", "0", "1", "1", "1", "2", "2", "2"),
                List.of("0", "0", "1", "1", "1", "2", "2", "2", "2")), 1e-12);
    }

    @Test
    void aSplitOfOneSampleIsNeverTheAnswer() {
        Expected digits = JudgementCases.all().stream().filter(c -> c.name().equals("digits")).findFirst()
                .orElseThrow().expected();
        Got split = got("supported", Map.of("a", 1796, "b", 1), List.of());
        assertFalse(JudgementSuite.judge(digits, split, 0.0, Map.of()).isEmpty());
        Got tenGroups = got("supported", Map.of("a", 180, "b", 179, "c", 178, "d", 177, "e", 176, "f", 175,
                "g", 174, "h", 173, "i", 190, "j", 195), List.of());
        assertEquals("", JudgementSuite.judge(digits, tenGroups, 0.6, Map.of()));
    }

    @Test
    void noStructureAcceptsOnlyKOfOne() {
        Expected none = Expected.none("one population");
        assertEquals("", JudgementSuite.judge(none, got("unsupported", Map.of("1", 150), List.of()), 1, Map.of()));
        assertEquals("", JudgementSuite.judge(none, got("unsupported", Map.of("1", 148), List.of("x", "y")), 1,
                Map.of()));
        assertFalse(JudgementSuite.judge(none, got("tentative", Map.of("1", 100, "2", 50), List.of()), 0, Map.of())
                .isEmpty());
    }

    @Test
    void farPointsMustBeSetAsideWhenTheAnswerSaysSo() {
        Expected e = new Expected(List.of(new Structure(Set.of(2), Expected.SUPPORTED, 10, Double.NaN, true)), "r");
        Map<String, String> truth = Map.of("far", SyntheticSets.FAR_POINT);
        Got inCluster = got("supported", Map.of("1", 80, "2", 71), List.of());
        Got asideGot = got("supported", Map.of("1", 80, "2", 70), List.of("far"));
        assertFalse(JudgementSuite.judge(e, inCluster, 1, truth).isEmpty());
        assertEquals("", JudgementSuite.judge(e, asideGot, 1, truth));
        // and an alternative answer is enough
        Expected either = new Expected(List.of(e.answers().get(0), new NoStructure()), "r");
        assertEquals("", JudgementSuite.judge(either, got("unsupported", Map.of("1", 151), List.of()), 1, truth));
    }

    // ---- helpers ----------------------------------------------------------------------------------------------

    /** A result with clusters of the given sizes (members named cluster:index) and outliers. */
    private static Got got(String verdict, Map<String, Integer> sizes, List<String> outliers) {
        var cluster = new LinkedHashMap<String, String>();
        sizes.forEach((c, n) -> {
            for (int i = 0; i < n; i++) {
                cluster.put(c + ":" + i, c);
            }
        });
        var list = new ArrayList<>(sizes.values());
        list.sort(java.util.Comparator.reverseOrder());
        return new Got(verdict, sizes.size(), List.copyOf(list), outliers, cluster);
    }

    private static double[][] rows(SyntheticSets.Set s) {
        return s.csv().lines().skip(1).map(l -> {
            String[] f = l.split(",");
            double[] v = new double[f.length - 1];
            for (int j = 1; j < f.length; j++) {
                v[j - 1] = Double.parseDouble(f[j]);
            }
            return v;
        }).toArray(double[][]::new);
    }

    private static double[][] log2Transposed(SyntheticSets.Set s) {
        double[][] genes = rows(s);
        double[][] x = new double[genes[0].length][genes.length];
        for (int g = 0; g < genes.length; g++) {
            for (int i = 0; i < genes[0].length; i++) {
                x[i][g] = Math.log(genes[g][i] + 1) / Math.log(2);
            }
        }
        return x;
    }

    private static Map<String, String> truth(SyntheticSets.Set s) {
        var m = new LinkedHashMap<String, String>();
        s.truthCsv().lines().skip(1).forEach(l -> {
            String[] f = l.split(",");
            m.put(f[0], f[1]);
        });
        return m;
    }

    private static double[][] zscore(double[][] x) {
        int n = x.length;
        int p = x[0].length;
        double[][] z = new double[n][p];
        for (int j = 0; j < p; j++) {
            double mean = 0;
            for (double[] r : x) {
                mean += r[j];
            }
            mean /= n;
            double ss = 0;
            for (double[] r : x) {
                ss += (r[j] - mean) * (r[j] - mean);
            }
            double sd = Math.sqrt(ss / n);
            for (int i = 0; i < n; i++) {
                z[i][j] = sd > 0 ? (x[i][j] - mean) / sd : 0;
            }
        }
        return z;
    }

    private static CondensedDistances euclidean(double[][] x) {
        int n = x.length;
        double[] d = new double[n * (n - 1) / 2];
        int t = 0;
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                double s = 0;
                for (int f = 0; f < x[i].length; f++) {
                    double diff = x[i][f] - x[j][f];
                    s += diff * diff;
                }
                d[t++] = Math.sqrt(s);
            }
        }
        return CondensedDistances.of(n, d);
    }
}
