package org.treeproof.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.treeproof.distance.Metric;

/**
 * End to end from the jar for the ways an input reaches a study: every metric with the default study options,
 * tables without ids, a spreadsheet's {@code sep=} line, a labels file with its own
 * delimiter, and the settings recorded for a distance table. Data are invented here by a seeded generator.
 */
class InputSideIT {
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path tmp;

    /** 30 samples in three groups of ten over 6 features: continuous values, or 0/1 values flipped with p = 0.1. */
    private Path table(String name, boolean binary) throws IOException {
        SplittableRandom rng = new SplittableRandom(20261202L);
        var sb = new StringBuilder("id");
        for (int j = 0; j < 12; j++) {
            sb.append(",f").append(j);
        }
        sb.append('\n');
        for (int i = 0; i < 30; i++) {
            int group = i / 10;
            sb.append("s").append(i);
            for (int j = 0; j < 12; j++) {
                boolean on = j / 4 == group;
                if (binary) {
                    sb.append(',').append(on != (rng.nextDouble() < 0.1) ? 1 : 0);
                } else {
                    sb.append(',').append(String.format(Locale.ROOT, "%.4f", (on ? 4 : 0) + rng.nextGaussian()));
                }
            }
            sb.append('\n');
        }
        return Files.writeString(tmp.resolve(name), sb.toString());
    }

    private JsonNode summary(String out) throws IOException {
        return JSON.readTree(tmp.resolve(out).resolve("summary.json").toFile());
    }

    private Jar.Result assess(String... args) throws Exception {
        var all = new ArrayList<>(List.of("assess"));
        all.addAll(List.of(args));
        all.add("--no-progress");
        return Jar.run(tmp, all.toArray(String[]::new));
    }

    @Test
    void jaccardAndHammingRunWithPureDefaults() throws Exception {
        // Before: refused for the default z-scoring and Ward linkage, and with those given by hand, failed after
        // every replicate because null and gap reference data were continuous.
        Path data = table("binary.csv", true);
        for (String metric : List.of("jaccard", "hamming")) {
            Jar.Result r = assess(data.toString(), "--metric", metric, "--out", metric);
            assertEquals(0, r.exit(), r.err());
            JsonNode s = summary(metric).path("settings");
            assertEquals("feature-frequency", s.path("gapReference").asText());
            assertEquals("none", s.path("scale").asText());
            // the input options are typed as given (log2 and topVariable were the strings "false" and "0") and the
            // table's orientation is recorded
            assertTrue(s.path("log2").isBoolean() && !s.path("log2").asBoolean(), s.toString());
            assertTrue(s.path("topVariable").isInt() && s.path("topVariable").asInt() == 0, s.toString());
            assertTrue(s.path("samplesInColumns").isBoolean() && !s.path("samplesInColumns").asBoolean(), s.toString());
            assertEquals(50, s.path("referenceSets").asInt());
            assertEquals(19, s.path("nullSets").asInt());
            assertEquals("[\"average\",\"complete\"]", s.path("linkages").toString());
            String methods = Files.readString(tmp.resolve(metric).resolve("methods.md"));
            assertTrue(methods.contains("drawn as 0/1 values with each feature's observed frequency of ones"), methods);
            assertEquals(3, summary(metric).path("recommendation").path("k").asInt(), r.out());
        }
    }

    @Test
    void everyMetricRunsWithTheDefaultStudyOptionsOnSmallerCounts() throws Exception {
        Path continuous = table("continuous.csv", false);
        Path binary = table("binary.csv", true);
        for (Metric m : Metric.values()) {
            String out = "m-" + m.id();
            Jar.Result r = assess((m.binaryOnly() ? binary : continuous).toString(), "--metric", m.id(), "--out", out,
                    "--replicates", "20", "--null-sets", "4", "--null-replicates", "4", "--reference-sets", "5");
            assertEquals(0, r.exit(), m.id() + ": " + r.err());
            JsonNode s = summary(out);
            assertEquals(m.id(), s.path("settings").path("metric").asText());
            assertEquals(5, s.path("settings").path("referenceSets").asInt());
            // every part ran: the gap statistic and null calibration for every linkage and k, with finite values
            for (JsonNode linkage : s.path("linkages")) {
                for (JsonNode k : linkage.path("byK")) {
                    assertTrue(k.path("gap").isNumber(), m.id() + " " + k);
                    // a number, or null where no null set has a cut into k clusters (NullCalibration: undefined)
                    JsonNode excess = k.path("stability").path("null").path("excess");
                    assertTrue(excess.isNumber() || excess.isNull(), m.id() + " " + k);
                }
            }
            assertEquals(m.binaryOnly() ? "feature-frequency" : "principal-box",
                    s.path("settings").path("gapReference").asText());
        }
    }

    @Test
    void stronglySkewedFeaturesAreNamedInThePreparationWithTheLogTransform() throws Exception {
        // f1 = exp(2 z): log-normal with sigma 2, skewness far beyond 2; f2 and f3 Gaussian around 10
        var rng = new java.util.SplittableRandom(3);
        var sb = new StringBuilder("id,f1,f2,f3\n");
        for (int i = 0; i < 120; i++) {
            sb.append(String.format(java.util.Locale.ROOT, "s%d,%.6f,%.6f,%.6f%n", i, Math.exp(2 * rng.nextGaussian()),
                    10 + rng.nextGaussian(), 10 + rng.nextGaussian()));
        }
        Path data = Files.writeString(tmp.resolve("skewed.csv"), sb.toString());
        String[] quick = {"--replicates", "10", "--null-sets", "0", "--reference-sets", "0", "--max-k", "4"};
        Jar.Result r = assess(concat(new String[] {data.toString(), "--out", "skewed"}, quick));
        assertEquals(0, r.exit(), r.err());
        String steps = summary("skewed").path("input").path("cautions").toString();
        assertTrue(steps.contains("Warning: 1 of 3 features has a long tail on one side (skewness beyond 2: f1 "), steps);
        assertTrue(steps.contains("--log2"), steps);
        String md = Files.readString(tmp.resolve("skewed").resolve("methods.md"));
        // listed after the paragraphs for the analyst, not inside the paragraph meant for a paper
        assertTrue(md.indexOf("long tail on one side") > md.indexOf("## What the preparation found"), md);
        assertTrue(md.indexOf("## What the preparation found") > md.indexOf("# Result"), md);
        assertFalse(summary("skewed").path("input").path("preparation").toString().contains("long tail"));
        assertTrue(Files.readString(tmp.resolve("skewed").resolve("report.html")).contains("What the preparation found"));
        // the same table with --log2: f1 becomes log2(1 + exp(2 z)), about a softplus of z, no longer skewed beyond 2
        r = assess(concat(new String[] {data.toString(), "--out", "logged", "--log2"}, quick));
        assertEquals(0, r.exit(), r.err());
        assertFalse(summary("logged").path("input").path("cautions").toString().contains("long tail"));
    }

    @Test
    void featuresWithSeparatedModesAreNotedWithZScoresOnly() throws Exception {
        // f1: three groups of 50 in a row, centres 6 apart (SD 1); f2-f4 Gaussian. Z-scoring divides f1 by about 5
        var rng = new java.util.SplittableRandom(8);
        var sb = new StringBuilder("id,f1,f2,f3,f4\n");
        for (int i = 0; i < 150; i++) {
            sb.append(String.format(java.util.Locale.ROOT, "s%d,%.6f,%.6f,%.6f,%.6f%n", i, 6 * (i / 50) + rng.nextGaussian(),
                    rng.nextGaussian(), rng.nextGaussian(), rng.nextGaussian()));
        }
        Path data = Files.writeString(tmp.resolve("modes.csv"), sb.toString());
        String[] quick = {"--replicates", "10", "--null-sets", "0", "--reference-sets", "0", "--max-k", "4"};
        Jar.Result r = assess(concat(new String[] {data.toString(), "--out", "modes"}, quick));
        assertEquals(0, r.exit(), r.err());
        String steps = summary("modes").path("input").path("cautions").toString();
        assertTrue(steps.contains("Note: 1 of the 4 features tested has values in separated modes on their own "
                + "(the dip test of Hartigan and Hartigan, Ann. Statist. 13 (1985) 70-84, family-wise level 0.01 over "
                + "the features tested): f1 (dip "), steps);
        assertTrue(steps.contains("--scale none"), steps);
        assertTrue(Files.readString(tmp.resolve("modes").resolve("methods.md")).contains("separated modes"));
        // without z-scores nothing divides f1 by its spread: no note
        r = assess(concat(new String[] {data.toString(), "--out", "unscaled", "--scale", "none"}, quick));
        assertEquals(0, r.exit(), r.err());
        assertFalse(summary("unscaled").path("input").path("cautions").toString().contains("separated modes"));
        // the same groups on three of the four features: most features separate them, z-scoring dilutes little, and
        // the note would only distract (the demo's strains differ on 36 of its 48 features)
        var most = new StringBuilder("id,f1,f2,f3,f4\n");
        for (int i = 0; i < 150; i++) {
            most.append(String.format(java.util.Locale.ROOT, "s%d,%.6f,%.6f,%.6f,%.6f%n", i, 6 * (i / 50)
                    + rng.nextGaussian(), 6 * (i / 50) + rng.nextGaussian(), 6 * (i / 50) + rng.nextGaussian(),
                    rng.nextGaussian()));
        }
        Path mostData = Files.writeString(tmp.resolve("most.csv"), most.toString());
        r = assess(concat(new String[] {mostData.toString(), "--out", "most"}, quick));
        assertEquals(0, r.exit(), r.err());
        assertFalse(summary("most").path("input").path("cautions").toString().contains("separated modes"));
    }

    private static String[] concat(String[] a, String[] b) {
        String[] out = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }

    @Test
    void aTableWithoutIdsIsStudiedWithRowNumbersAndASepLineIsHonoured() throws Exception {
        List<String> lines = Files.readAllLines(table("continuous.csv", false));
        var noIds = new StringBuilder();
        var excel = new StringBuilder("sep=;\r\n");
        for (String line : lines) {
            noIds.append(line.substring(line.indexOf(',') + 1)).append('\n');
            excel.append(line.replace(',', ';')).append("\r\n");
        }
        Files.writeString(tmp.resolve("no-ids.csv"), noIds);
        Files.writeString(tmp.resolve("excel.csv"), excel);
        String[] quick = {"--replicates", "10", "--null-sets", "0", "--reference-sets", "0", "--max-k", "4"};
        var args = new ArrayList<>(List.of("no-ids.csv", "--no-ids", "--out", "no-ids"));
        args.addAll(List.of(quick));
        Jar.Result r = assess(args.toArray(String[]::new));
        assertEquals(0, r.exit(), r.err());
        List<String> clusters = Files.readAllLines(tmp.resolve("no-ids").resolve("clusters.csv"));
        assertTrue(clusters.get(1).startsWith("1,"), clusters.get(1));
        assertTrue(clusters.get(30).startsWith("30,"), clusters.get(30));
        args = new ArrayList<>(List.of("excel.csv", "--out", "excel"));
        args.addAll(List.of(quick));
        r = assess(args.toArray(String[]::new));
        assertEquals(0, r.exit(), r.err());
        assertEquals(12, summary("excel").path("input").path("features").asInt());
    }

    @Test
    void theLabelsFileIsReadWithItsOwnDelimiter() throws Exception {
        // A ';' data table in a .txt file (--delimiter ';') and a comma-separated labels file: before, the labels
        // were read with ';' and refused as having one field per row.
        List<String> lines = Files.readAllLines(table("continuous.csv", false));
        var semicolons = new StringBuilder();
        var labels = new StringBuilder("id,group\n");
        for (int i = 0; i < lines.size(); i++) {
            semicolons.append(lines.get(i).replace(',', ';')).append('\n');
            if (i > 0) {
                labels.append("s").append(i - 1).append(",g").append((i - 1) / 10).append('\n');
            }
        }
        Files.writeString(tmp.resolve("data.txt"), semicolons);
        Files.writeString(tmp.resolve("groups.csv"), labels);
        Jar.Result r = assess("data.txt", "--delimiter", ";", "--labels", "groups.csv", "--out", "labelled",
                "--replicates", "10", "--null-sets", "0", "--reference-sets", "0", "--max-k", "4");
        assertEquals(0, r.exit(), r.err());
        assertTrue(Files.readString(tmp.resolve("labelled").resolve("report.html")).contains("groups.csv"));
    }

    @Test
    void aDistanceTableRecordsOnlyTheSettingsThatTookEffect() throws Exception {
        Path dist = Path.of("src/test/resources/input/distances/iris-head-euclidean.csv").toAbsolutePath();
        Jar.Result r = assess(dist.toString(), "--distances", "--out", "dist", "--replicates", "10", "--max-k", "3");
        assertEquals(0, r.exit(), r.err());
        JsonNode s = summary("dist").path("settings");
        assertEquals(0, s.path("referenceSets").asInt());
        assertEquals(0, s.path("nullSets").asInt());
        assertFalse(s.has("gapReference"), s.toString());
        assertFalse(s.has("nullReplicates"), s.toString());
        String report = Files.readString(tmp.resolve("dist").resolve("report.html"), StandardCharsets.UTF_8);
        assertTrue(report.contains("not computed: distances only"), "report settings say why");
        // the table's metric is the user's: not called Euclidean, and Ward's assumption is said
        assertEquals("precomputed", s.path("metric").asText());
        assertFalse(report.contains("Euclidean distances"), "the header names no metric for a distance table");
        assertTrue(r.err().contains("note: ward linkage assumes the given distances are Euclidean"), r.err());
        // and said where a reader of the results sees it, not only on the terminal
        String methods = Files.readString(tmp.resolve("dist").resolve("methods.md"));
        assertTrue(methods.contains("ward linkage assumes the given distances are Euclidean"), methods);
        assertTrue(report.contains("ward linkage assumes the given distances are Euclidean"), "in the report");
        assertTrue(summary("dist").path("input").path("cautions").toString()
                .contains("ward linkage assumes the given distances are Euclidean"));
        assertFalse(methods.contains(".."), "no double stop");
    }

    @Test
    void zeroOneDataGetNoSkewWarning() throws Exception {
        // f1 is 1 in 5 of 120 samples (skewness about 4.4), f2 and f3 in about half: the null of 0/1 data draws each
        // feature at its frequency of ones, so the warning about symmetric nulls and --log2 does not apply
        var sb = new StringBuilder("id,f1,f2,f3\n");
        var rng = new java.util.SplittableRandom(4);
        for (int i = 0; i < 120; i++) {
            sb.append(String.format(java.util.Locale.ROOT, "s%d,%d,%d,%d%n", i, i % 24 == 0 ? 1 : 0, rng.nextInt(2),
                    rng.nextInt(2)));
        }
        Path data = Files.writeString(tmp.resolve("binary.csv"), sb.toString());
        Jar.Result r = assess(data.toString(), "--metric", "jaccard", "--out", "binary", "--replicates", "10",
                "--null-sets", "0", "--reference-sets", "0", "--max-k", "4");
        assertEquals(0, r.exit(), r.err());
        assertFalse(summary("binary").path("input").path("cautions").toString().contains("long tail"));
    }

    /**
     * Counts of 300 genes (rows) in 36 samples (columns) of three subtypes, each with 30 genes at four times the
     * base rate, read at depths from 1/4 to 4 times a base (log-uniform), Poisson-distributed (commons-math3,
     * seeded). Without library-size scaling the depths, which move every gene at once, compete with the subtypes
     * and the outputs note the uneven totals; with {@code --library-size median-ratio} the three subtypes come back
     * exactly and the method is recorded, described and cited.
     */
    @Test
    void librarySizeScalingRecoversSubtypesReadAtUnevenDepths() throws Exception {
        var rng = new org.apache.commons.math3.random.Well19937c(20261203L);
        int n = 36;
        int genes = 300;
        double[] depth = new double[n];
        var header = new StringBuilder("gene");
        var labels = new StringBuilder("id,subtype\n");
        for (int i = 0; i < n; i++) {
            depth[i] = Math.pow(4, 2 * rng.nextDouble() - 1);
            header.append(",c").append(i);
            labels.append("c").append(i).append(",t").append(i % 3).append('\n');
        }
        var sb = new StringBuilder(header).append('\n');
        for (int g = 0; g < genes; g++) {
            double base = 10 + 50 * rng.nextDouble();
            sb.append("g").append(g);
            for (int i = 0; i < n; i++) {
                double mean = base * depth[i] * (g < 90 && g / 30 == i % 3 ? 4 : 1);
                sb.append(',').append(new org.apache.commons.math3.distribution.PoissonDistribution(rng, mean,
                        org.apache.commons.math3.distribution.PoissonDistribution.DEFAULT_EPSILON,
                        org.apache.commons.math3.distribution.PoissonDistribution.DEFAULT_MAX_ITERATIONS).sample());
            }
            sb.append('\n');
        }
        Path data = Files.writeString(tmp.resolve("counts.csv"), sb.toString());
        Path truth = Files.writeString(tmp.resolve("subtypes.csv"), labels.toString());

        Jar.Result plain = assess(data.toString(), "--samples-in-columns", "--log2", "--labels", truth.toString(),
                "--reference-sets", "10", "--out", "plain");
        assertEquals(0, plain.exit(), plain.err());
        JsonNode p = summary("plain");
        assertEquals("none", p.path("settings").path("librarySize").asText());
        assertTrue(p.path("input").path("cautions").toString().contains("--library-size median-ratio (or total)"),
                p.path("input").path("cautions").toString());

        Jar.Result scaled = assess(data.toString(), "--samples-in-columns", "--log2", "--library-size",
                "median-ratio", "--labels", truth.toString(), "--reference-sets", "10", "--out", "scaled");
        assertEquals(0, scaled.exit(), scaled.err());
        JsonNode s = summary("scaled");
        assertEquals("median-ratio", s.path("settings").path("librarySize").asText());
        assertFalse(s.path("input").path("cautions").toString().contains("--library-size"));
        assertTrue(s.path("input").path("preparation").get(1).asText().startsWith(
                "Divided each sample's counts by its size factor from the median-ratio method"), s.toString());
        assertEquals(3, s.path("recommendation").path("k").asInt(), scaled.out());
        assertEquals(1.0, s.path("labels").path("ari").asDouble(), 1e-12);
        assertTrue(p.path("labels").path("ari").asDouble() < 0.5, "without scaling the depths decide: "
                + p.path("labels"));
        String methods = Files.readString(tmp.resolve("scaled").resolve("methods.md"));
        assertTrue(methods.contains("median-ratio method (Anders & Huber, 2010;"), methods);
        assertTrue(methods.contains("Anders, S. & Huber, W. (2010). Differential expression analysis for sequence"
                + " count data."), methods);
    }
}
