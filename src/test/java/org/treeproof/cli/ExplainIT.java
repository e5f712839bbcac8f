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
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.SplittableRandom;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The explanation end to end from the jar, on seeded invented tables: planted markers rank first, a batch-only
 * data set has its batch flagged and nothing else, and the alternative analyses agree on planted clusters and
 * not all of them on noise.
 */
class ExplainIT {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final String[] QUICK = {"--replicates", "40", "--null-replicates", "5", "--reference-sets", "0",
        "--no-progress", "--threads", "2"};

    @TempDir
    Path tmp;

    /** Samples in rows; {@code shift[i][j]} added to standard normal noise. */
    private Path table(String name, int n, int m, long seed, java.util.function.BiFunction<Integer, Integer, Double> shift)
            throws IOException {
        var r = new SplittableRandom(seed);
        var sb = new StringBuilder("sample");
        for (int j = 0; j < m; j++) {
            sb.append(",marker-").append(j);
        }
        sb.append('\n');
        for (int i = 0; i < n; i++) {
            sb.append(String.format("s%03d", i));
            for (int j = 0; j < m; j++) {
                sb.append(',').append(String.format(java.util.Locale.ROOT, "%.5f", r.nextGaussian() + shift.apply(i, j)));
            }
            sb.append('\n');
        }
        Path p = tmp.resolve(name);
        Files.writeString(p, sb.toString());
        return p;
    }

    /** id, batch (given), sex and age (random), site with some values missing; tab-separated (named .tsv). */
    private Path covariates(String name, int n, long seed, java.util.function.IntFunction<String> batch)
            throws IOException {
        var r = new SplittableRandom(seed);
        var sb = new StringBuilder("id\tbatch\tsex\tage\tsite\n");
        for (int i = 0; i < n; i++) {
            sb.append(String.format("s%03d\t%s\t%s\t%.1f\t%s%n", i, batch.apply(i), r.nextBoolean() ? "f" : "m",
                    20 + 50 * r.nextDouble(), r.nextInt(6) == 0 ? "NA" : "site-" + (1 + r.nextInt(3))));
        }
        Path p = tmp.resolve(name);
        Files.writeString(p, sb.toString());
        return p;
    }

    private Jar.Result run(String... args) throws Exception {
        var all = new ArrayList<>(List.of(args));
        all.addAll(List.of(QUICK));
        return Jar.run(tmp, all.toArray(String[]::new));
    }

    private static List<CSVRecord> csv(Path file) throws IOException {
        try (var p = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(Files.newBufferedReader(file))) {
            return p.getRecords();
        }
    }

    @Test
    void plantedMarkersRankFirstAndOtherAnalysesAgree() throws Exception {
        // 3 groups of 30; group g raises markers 3g..3g+2 by 4 standard deviations; 40 features
        Path data = table("planted.csv", 90, 40, 1, (i, j) -> j / 3 == i / 30 ? 4.0 : 0.0);
        Path cov = covariates("planted-covariates.tsv", 90, 2, i -> "run-" + (1 + i % 2));
        Jar.Result r = run("assess", data.toString(), "--out", "planted", "--covariates", cov.toString(),
                "--sensitivity");
        assertEquals(0, r.exit(), r.err());
        Path dir = tmp.resolve("planted");
        JsonNode s = JSON.readTree(dir.resolve("summary.json").toFile());
        assertEquals(3, s.get("recommendation").get("k").asInt());
        // the covariates file is recorded as given, beside the other input settings
        assertEquals(cov.toString(), s.get("settings").get("covariatesFile").asText());

        List<CSVRecord> features = csv(dir.resolve("features.csv"));
        assertEquals(List.of("cluster", "feature", "rank", "effect", "auc", "meanInCluster", "meanElsewhere", "pValue",
                "qValue"), List.of(Files.readAllLines(dir.resolve("features.csv")).get(0).split(",")));
        assertEquals(3 * 40, features.size());
        for (int c = 1; c <= 3; c++) {
            String cl = Integer.toString(c);
            Set<String> top = new HashSet<>();
            features.stream().filter(x -> x.get("cluster").equals(cl) && Integer.parseInt(x.get("rank")) <= 3)
                    .forEach(x -> top.add(x.get("feature")));
            // the cluster's planted markers are its top three, whichever group number it got
            int g = Integer.parseInt(top.iterator().next().substring("marker-".length())) / 3;
            assertEquals(Set.of("marker-" + 3 * g, "marker-" + (3 * g + 1), "marker-" + (3 * g + 2)), top, "cluster " + c);
            features.stream().filter(x -> x.get("cluster").equals(cl) && top.contains(x.get("feature")))
                    .forEach(x -> assertTrue(Double.parseDouble(x.get("qValue")) < 1e-6, x.toString()));
        }

        List<CSVRecord> covs = csv(dir.resolve("covariates.csv"));
        assertEquals(List.of("batch", "sex", "age", "site"), covs.stream().map(x -> x.get("covariate")).toList());
        assertEquals("numeric", covs.get(2).get("kind"));
        assertTrue(covs.stream().noneMatch(x -> x.get("flagged").equals("true")), covs.toString());

        List<CSVRecord> sens = csv(dir.resolve("sensitivity.csv"));
        // every linkage runs the other three scalings and log2; Ward takes Euclidean distances only, the other
        // linkages also run every other metric
        var expected = new java.util.ArrayList<>(List.of("scale: none", "scale: center", "scale: robust", "log2: on"));
        if (!s.get("recommendation").get("linkage").asText().equals("ward")) {
            expected.addAll(List.of("metric: sqeuclidean", "metric: manhattan", "metric: chebyshev", "metric: cosine",
                    "metric: pearson", "metric: spearman"));
        }
        assertEquals(expected, sens.stream().map(x -> x.get("alternative")).toList());
        for (CSVRecord x : sens.subList(0, 3)) {
            assertTrue(Double.parseDouble(x.get("ari")) > 0.9, x.toString());
            assertEquals("3", x.get("clustersSurviving"), x.toString());
        }
        assertTrue(sens.get(3).get("note").startsWith("not run: "), sens.get(3).toString());

        Document html = Jsoup.parse(dir.resolve("report.html").toFile(), "UTF-8");
        for (String id : List.of("features", "covariates", "sensitivity")) {
            assertFalse(html.select("#" + id).isEmpty(), "section " + id);
            assertFalse(html.select("nav a[href=#" + id + "]").isEmpty(), "nav " + id);
        }
        assertFalse(html.select("#figure-features img").isEmpty());
        assertFalse(html.select("#figure-sensitivity img").isEmpty());
        assertTrue(html.select("#features").text().contains("double dipping"));
        String methods = Files.readString(dir.resolve("methods.md"), StandardCharsets.UTF_8);
        for (int c = 1; c <= 3; c++) {
            assertTrue(java.util.regex.Pattern.compile("Cluster " + c + " \\(\\d+ samples\\) is set apart most by marker-")
                    .matcher(methods).find(), methods);
        }
        assertTrue(methods.contains("Benjamini & Hochberg, 1995"));
        // every work cited in the text has its entry under References (epsilon-squared's and Cramér's V's sources
        // were cited, or named, without one): each "(Author[ & Author| et al.], year)" citation is matched to an
        // entry starting with that first author's surname
        String text = methods.substring(0, methods.indexOf("## References"));
        String refs = methods.substring(methods.indexOf("## References"));
        var cite = java.util.regex.Pattern.compile("([A-ZÀ-Ž][\\p{L}-]+)(?: & [\\p{L}-]+| et al\\.)?, (\\d{4})")
                .matcher(text);
        int citations = 0;
        while (cite.find()) {
            citations++;
            assertTrue(refs.contains("- " + cite.group(1) + ", ") && refs.contains("(" + cite.group(2) + ")"),
                    "no entry for " + cite.group() + " in\n" + refs);
        }
        assertTrue(citations >= 5, "citations found: " + citations);
        assertTrue(refs.contains("- Tomczak, M.") && refs.contains("- Cramér, H."), refs);
    }

    @Test
    void batchOnlyDataHasItsBatchFlaggedAndNothingElse() throws Exception {
        // one population measured in two batches: batch 2 reads 3 units higher on every feature
        Path data = table("batches.csv", 80, 30, 3, (i, j) -> i % 2 == 1 ? 3.0 : 0.0);
        Path cov = covariates("batches-covariates.tsv", 80, 4, i -> "batch-" + (1 + i % 2));
        Jar.Result r = run("assess", data.toString(), "--out", "batches", "--covariates", cov.toString());
        assertEquals(0, r.exit(), r.err());
        Path dir = tmp.resolve("batches");
        List<CSVRecord> covs = csv(dir.resolve("covariates.csv"));
        assertEquals("true", covs.get(0).get("flagged"), covs.toString());
        assertEquals("chi-square", covs.get(0).get("test"));
        for (CSVRecord c : covs.subList(1, covs.size())) {
            assertEquals("false", c.get("flagged"), c.toString());
        }
        JsonNode s = JSON.readTree(dir.resolve("summary.json").toFile());
        assertEquals("batch", s.get("explain").get("flaggedCovariates").get(0).asText());
        boolean inReasons = false;
        for (JsonNode reason : s.get("recommendation").get("reasons")) {
            inReasons |= reason.get("text").asText().contains("largely follow the covariate 'batch'");
        }
        assertTrue(inReasons, s.get("recommendation").get("reasons").toString());
        Document html = Jsoup.parse(dir.resolve("report.html").toFile(), "UTF-8");
        assertTrue(html.select("#decision ul.reasons li").first().text().contains("largely follow the covariate 'batch'"),
                html.select("#decision").text());
        assertFalse(Files.exists(dir.resolve("sensitivity.csv")));
    }

    @Test
    void centringWithinTheBatchesFindsTheGroupsTheBatchHid() throws Exception {
        // three groups of 30 (2 units up on their own 8 of 40 features, 5.7 apart) crossed evenly with two batches
        // (the second 3 units up on every feature, 19 apart): the batch outweighs the groups
        Path data = table("crossed.csv", 90, 40, 11,
                (i, j) -> (j / 8 == i % 3 ? 2.0 : 0.0) + (i % 2 == 1 ? 3.0 : 0.0));
        Path cov = covariates("crossed-covariates.tsv", 90, 12, i -> "run-" + (1 + i % 2));
        var groups = new StringBuilder("id,group\n");
        for (int i = 0; i < 90; i++) {
            groups.append(String.format("s%03d,g%d%n", i, i % 3));
        }
        Path labels = tmp.resolve("groups.csv");
        Files.writeString(labels, groups.toString());
        Jar.Result plain = run("assess", data.toString(), "--out", "plain", "--covariates", cov.toString(),
                "--labels", labels.toString());
        assertEquals(0, plain.exit(), plain.err());
        JsonNode before = JSON.readTree(tmp.resolve("plain/summary.json").toFile());
        assertEquals("batch", before.get("explain").get("flaggedCovariates").get(0).asText());
        // the batch splits every group (k = 6, groups within runs, or k = 2, the runs): never the three groups
        assertTrue(before.get("recommendation").get("k").asInt() != 3, before.get("labels").toString());
        assertTrue(before.get("labels").get("ari").asDouble() < 0.6, before.get("labels").toString());
        assertTrue(before.get("recommendation").get("reasons").toString().contains("rerun with --center-within"),
                before.get("recommendation").get("reasons").toString());

        Jar.Result centred = run("assess", data.toString(), "--out", "centred", "--covariates", cov.toString(),
                "--labels", labels.toString(), "--center-within", "batch");
        assertEquals(0, centred.exit(), centred.err());
        Path dir = tmp.resolve("centred");
        JsonNode after = JSON.readTree(dir.resolve("summary.json").toFile());
        assertEquals("supported", after.get("recommendation").get("verdict").asText());
        assertEquals(3, after.get("recommendation").get("k").asInt());
        assertTrue(after.get("labels").get("ari").asDouble() > 0.9, after.get("labels").toString());
        assertEquals(0, after.get("explain").get("flaggedCovariates").size(), after.get("explain").toString());
        assertTrue(after.toString().contains("\"centerWithin\""), "settings record the column");
        // the cost of centring is said beside the decision
        assertTrue(after.get("input").get("cautions").toString().contains("Groups spread unevenly over its levels lose "
                + "part of their difference"), after.get("input").get("cautions").toString());
        String methods = Files.readString(dir.resolve("methods.md"));
        assertTrue(methods.contains("Removed each level's mean of the covariate 'batch' (2 levels) from every feature"),
                methods);
        assertTrue(methods.contains("Sims et al., 2008") && methods.contains("Nygaard et al., 2016"), methods);
        Document html = Jsoup.parse(dir.resolve("report.html").toFile(), "UTF-8");
        String refs = html.select("#references").text();
        assertTrue(refs.contains("Sims, A. H.") && refs.contains("Nygaard, V."), refs);
        assertTrue(html.text().contains("Removed each level's mean of the covariate 'batch'"), "preparation step shown");
    }

    @Test
    void centringWithinABatchIsRefusedInOneLineWhenItCannotBeDone() throws Exception {
        Path data = table("small2.csv", 30, 5, 8, (i, j) -> 0.0);
        Path cov = covariates("cov3.tsv", 30, 9, i -> i == 0 ? "solo" : "b" + i % 2);
        Jar.Result noFile = run("assess", data.toString(), "--out", "c1", "--center-within", "batch");
        assertEquals(2, noFile.exit());
        assertTrue(noFile.err().contains("--center-within batch names a column of --covariates FILE"), noFile.err());
        Jar.Result noColumn = run("assess", data.toString(), "--out", "c2", "--covariates", cov.toString(),
                "--center-within", "plate");
        assertEquals(2, noColumn.exit());
        assertTrue(noColumn.err().contains("has no column 'plate' (its columns: batch, sex, age, site)"),
                noColumn.err());
        Jar.Result lone = run("assess", data.toString(), "--out", "c3", "--covariates", cov.toString(),
                "--center-within", "batch");
        assertEquals(2, lone.exit());
        assertTrue(lone.err().contains("level 'solo' holds only sample 's000'"), lone.err());
        Jar.Result missing = run("assess", data.toString(), "--out", "c4", "--covariates", cov.toString(),
                "--center-within", "site");
        assertEquals(2, missing.exit());
        assertTrue(missing.err().contains("has no value in that column"), missing.err());
        for (String o : List.of("c1", "c2", "c3", "c4")) {
            assertFalse(Files.exists(tmp.resolve(o)), o);
        }
        for (Jar.Result r : List.of(noFile, noColumn, lone, missing)) {
            assertEquals(1, Arrays.stream(r.err().split("\n")).filter(l -> !l.isBlank()).count(), r.err());
            assertFalse(r.err().contains("Exception"), r.err());
        }
    }

    @Test
    void noiseHasNothingToStressEvenWithoutNullData() throws Exception {
        Path data = table("noise.csv", 100, 20, 5, (i, j) -> 0.0);
        // without null calibration noise once gave a tentative split of extreme samples to stress; now no solution
        // is recommended for it, so there are no clusters to explain and no alternative analyses to compare
        Jar.Result r = run("assess", data.toString(), "--out", "noise", "--linkages", "average", "--null-sets", "0",
                "--sensitivity");
        assertEquals(0, r.exit(), r.err());
        Path dir = tmp.resolve("noise");
        JsonNode s = JSON.readTree(dir.resolve("summary.json").toFile());
        assertEquals("unsupported", s.get("recommendation").get("verdict").asText());
        assertEquals(1, s.get("recommendation").get("k").asInt());
        assertFalse(Files.exists(dir.resolve("sensitivity.csv")));
    }

    @Test
    void badCovariateInputIsRefusedInOneLine() throws Exception {
        Path data = table("small.csv", 30, 5, 6, (i, j) -> 0.0);
        Path cov = covariates("cov.tsv", 29, 7, i -> "b" + i % 2);
        Jar.Result missing = run("assess", data.toString(), "--out", "o1", "--covariates", cov.toString());
        assertEquals(2, missing.exit());
        assertTrue(missing.err().contains("1 sample(s) of the study have no row, the first is 's029'"), missing.err());
        Path full = covariates("cov2.tsv", 30, 7, i -> "b" + i % 2);
        Jar.Result kind = run("assess", data.toString(), "--out", "o2", "--covariates", full.toString(),
                "--covariate-kind", "height=numeric");
        assertEquals(2, kind.exit());
        assertTrue(kind.err().contains("has no covariate 'height'"), kind.err());
        Jar.Result notNumber = run("assess", data.toString(), "--out", "o3", "--covariates", full.toString(),
                "--covariate-kind", "sex=numeric");
        assertEquals(2, notNumber.exit());
        assertTrue(notNumber.err().contains(":2:3: 'f' is not a number") || notNumber.err().contains(":2:3: 'm' is not a number"),
                notNumber.err());
        Path odd = tmp.resolve("cov.dat");
        Files.copy(full, odd);
        Jar.Result name = run("assess", data.toString(), "--out", "o4", "--covariates", odd.toString());
        assertEquals(2, name.exit());
        assertTrue(name.err().contains("cannot tell the delimiter from the file name"), name.err());
        for (String o : List.of("o1", "o2", "o3", "o4")) {
            assertFalse(Files.exists(tmp.resolve(o)), o);
        }
        assertEquals(1, Arrays.stream(missing.err().split("\n")).filter(l -> !l.isBlank()).count(), missing.err());
    }
}
