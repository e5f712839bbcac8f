package org.treeproof.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * End to end from the shaded jar, asserting on the files a user gets: the demo tables' planted answers
 * (demo-data/README.md), the report's structure, the CSV contracts and the reproducibility guarantees.
 */
class AssessIT {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Path DEMO = Path.of("demo-data").toAbsolutePath();

    @TempDir
    Path tmp;

    private JsonNode assess(String table, String out, String... extra) throws Exception {
        var args = new java.util.ArrayList<>(List.of("assess", DEMO.resolve(table).toString(), "--log2", "--out", out,
                "--no-progress", "--labels", DEMO.resolve(table.replace(".csv", "-truth.csv")).toString()));
        args.addAll(List.of(extra));
        Jar.Result r = Jar.run(tmp, args.toArray(String[]::new));
        assertEquals(0, r.exit(), r.err());
        return JSON.readTree(tmp.resolve(out).resolve("summary.json").toFile());
    }

    @Test
    void plantedDemoIsSupportedAtItsPlantedK() throws Exception {
        JsonNode s = assess("yeast-batches.csv", "planted");
        JsonNode rec = s.get("recommendation");
        assertEquals("supported", rec.get("verdict").asText());
        assertEquals(3, rec.get("k").asInt());
        assertEquals(1.0, s.get("labels").get("ari").asDouble(), 1e-12);
        Path dir = tmp.resolve("planted");

        // clusters.csv: header and one row per sample; scores.csv: one row per linkage and k
        List<CSVRecord> clusters = csv(dir.resolve("clusters.csv"));
        assertEquals(List.of("sample", "cluster", "stability", "silhouette", "flag"), header(dir.resolve("clusters.csv")));
        assertEquals(180, clusters.size());
        assertEquals(3, clusters.stream().map(c -> c.get("cluster")).distinct().count());
        List<CSVRecord> scores = csv(dir.resolve("scores.csv"));
        assertEquals(3 * 9, scores.size());
        // the separation test: scores.csv's separationP is summary.json's largest p over the clusters, and the
        // recommended solution met it (the demo's strains lie far apart)
        for (JsonNode l : s.get("linkages")) {
            for (JsonNode e : l.get("byK")) {
                JsonNode sep = e.get("separation");
                double largest = 0;
                for (JsonNode c : sep.get("clusters")) {
                    largest = Math.max(largest, c.get("pValue").asDouble());
                }
                assertEquals(largest, sep.get("pValue").asDouble(), 0);
                CSVRecord row = scores.stream().filter(r -> r.get("linkage").equals(l.get("linkage").asText())
                        && r.get("k").equals(e.get("k").asText())).findFirst().orElseThrow();
                assertEquals(largest, Double.parseDouble(row.get("separationP")), 0);
            }
        }
        assertTrue(chosen(s).get("conditionsMet").toString().contains("every-cluster-separated"));

        // the report parses, holds every section and embeds every chart that was drawn
        Document html = Jsoup.parse(dir.resolve("report.html").toFile(), "UTF-8");
        for (String id : List.of("decision", "evidence", "linkages", "flags", "labels", "reproducibility", "caution")) {
            assertFalse(html.select("#" + id).isEmpty(), "section " + id);
        }
        long charts;
        try (Stream<Path> files = Files.list(dir.resolve("charts"))) {
            charts = files.filter(p -> p.toString().endsWith(".png")).count();
        }
        assertEquals(10, charts); // the eight study charts, the consensus CDF and the features chart
        assertEquals(charts, html.select("img[src^=data:image/png;base64,]").size());
        assertTrue(html.select("script").isEmpty());
        assertTrue(html.text().contains(s.get("input").get("sha256").asText()));

        // the methods paragraph's figures equal summary.json's at the printed precision
        String methods = Files.readString(dir.resolve("methods.md"), StandardCharsets.UTF_8);
        JsonNode chosen = chosen(s);
        assertTrue(methods.contains(String.format(Locale.ROOT, "mean ARI %.2f over 200 replicates",
                chosen.get("stability").get("ariMean").asDouble())), methods);
        assertTrue(methods.contains(String.format(Locale.ROOT, "average silhouette %.3f",
                chosen.get("silhouette").asDouble())), methods);
        assertTrue(methods.contains(String.format(Locale.ROOT, "an excess of %.1f over the null",
                chosen.get("stability").get("null").get("excess").asDouble())), methods);
        assertTrue(methods.contains("treeproof " + s.get("tool").get("version").asText() + " (seed 1)"), methods);
    }

    @Test
    void structurelessDemoIsUnsupportedWithKOne() throws Exception {
        JsonNode rec = assess("single-strain-batches.csv", "flat").get("recommendation");
        assertEquals("unsupported", rec.get("verdict").asText());
        assertEquals(1, rec.get("k").asInt());
        String methods = Files.readString(tmp.resolve("flat").resolve("methods.md"), StandardCharsets.UTF_8);
        assertTrue(methods.contains("No convincing cluster structure"), methods);
        assertTrue(csv(tmp.resolve("flat").resolve("clusters.csv")).stream().allMatch(c -> c.get("cluster").equals("1")));
    }

    @Test
    void aLinkageWithoutSomeKStillHasItsStabilityChart() throws Exception {
        // src/test/resources/cli/noise-120x6.csv (made by reference/data/cli_noise.py): average linkage has no cut
        // into 10 clusters of at least 5 samples. The stability chart was refused and the report pointed to a
        // charts/stability.png that did not exist; now every k assessed is on its axis and the caption says why
        // average linkage has no value at k = 10
        Path table = Path.of("src", "test", "resources", "cli", "noise-120x6.csv").toAbsolutePath();
        Jar.Result r = Jar.run(tmp, "assess", table.toString(), "--out", "noise", "--no-progress");
        assertEquals(0, r.exit(), r.err());
        JsonNode s = JSON.readTree(tmp.resolve("noise/summary.json").toFile());
        int averageKs = 0;
        for (JsonNode le : s.get("linkages")) {
            if (le.get("linkage").asText().equals("average")) {
                averageKs = le.get("byK").size();
            }
        }
        assertEquals(8, averageKs, "the data no longer exercise a linkage without k = 10");
        assertTrue(Files.size(tmp.resolve("noise/charts/stability.png")) > 0);
        org.jsoup.nodes.Document html = org.jsoup.Jsoup.parse(tmp.resolve("noise/report.html").toFile(), "UTF-8");
        assertTrue(html.select("#figure-stability img").size() == 1, "the stability chart is embedded");
        assertTrue(html.selectFirst("#figure-stability figcaption").text()
                .contains("average linkage has no cut into k = 10 clusters of at least 5 samples"));
        for (org.jsoup.nodes.Element figure : html.select("figure.absent")) {
            assertTrue(figure.text().contains("Not drawn:"), "an absent figure says why: " + figure.text());
        }
    }

    @Test
    void nestedDemoShowsBothLevels() throws Exception {
        JsonNode rec = assess("nested-strains.csv", "nested").get("recommendation");
        var levels = new java.util.ArrayList<Integer>();
        rec.get("levels").forEach(l -> levels.add(l.asInt()));
        assertTrue(levels.contains(2) && levels.contains(4), "levels " + levels);
    }

    @Test
    void summaryIsByteIdenticalForOneTwoAndFourThreads() throws Exception {
        String[] small = {"--replicates", "40", "--null-sets", "19", "--null-replicates", "4", "--reference-sets", "8"};
        assess("nested-strains.csv", "t1", cat(small, "--threads", "1"));
        assess("nested-strains.csv", "t2", cat(small, "--threads", "2"));
        assess("nested-strains.csv", "t4", cat(small, "--threads", "4"));
        byte[] one = Files.readAllBytes(tmp.resolve("t1/summary.json"));
        byte[] two = Files.readAllBytes(tmp.resolve("t2/summary.json"));
        byte[] four = Files.readAllBytes(tmp.resolve("t4/summary.json"));
        assertArrayEquals(one, two);
        assertArrayEquals(one, four);
        assertEquals(Files.readString(tmp.resolve("t1/scores.csv")), Files.readString(tmp.resolve("t4/scores.csv")));
    }

    @Test
    void aRunKilledMidwayResumesToTheSameSummary() throws Exception {
        String table = DEMO.resolve("yeast-batches.csv").toString();
        String[] common = {"assess", table, "--log2", "--no-progress", "--replicates", "60", "--null-replicates", "4",
            "--reference-sets", "8"};
        String[] args = cat(common, "--out", "resumed");
        // the fault hook halts the JVM abruptly (exit 137, no shutdown hooks) after 25 replicates are kept
        Jar.Result killed = Jar.run(tmp, List.of("-Dtreeproof.faultAfterReplicates=25"), args);
        assertEquals(137, killed.exit());
        assertFalse(Files.exists(tmp.resolve("resumed")), "no directory under the target name after a kill");
        Jar.Result resumed = Jar.run(tmp, cat(args, "--resume"));
        assertEquals(0, resumed.exit(), resumed.err());
        assertTrue(resumed.err().contains("resuming with 25 replicates"), resumed.err());
        Jar.Result whole = Jar.run(tmp, cat(common, "--out", "whole", "--threads", "1"));
        assertEquals(0, whole.exit(), whole.err());
        assertArrayEquals(Files.readAllBytes(tmp.resolve("whole/summary.json")),
                Files.readAllBytes(tmp.resolve("resumed/summary.json")));
        assertFalse(Files.exists(tmp.resolve(".resumed.checkpoint")), "checkpoint removed once done");
    }

    @Test
    void anExistingOutputIsRefusedWithoutForce() throws Exception {
        Files.createDirectories(tmp.resolve("taken"));
        Files.writeString(tmp.resolve("taken/keep.txt"), "mine");
        Jar.Result r = Jar.run(tmp, "assess", DEMO.resolve("yeast-batches.csv").toString(), "--out", "taken");
        assertEquals(2, r.exit());
        assertTrue(r.err().contains("already exists"), r.err());
        assertEquals("mine", Files.readString(tmp.resolve("taken/keep.txt")));
    }

    @Test
    void tooLittleMemoryIsSaidBeforeAllocatingWithExitThree() throws Exception {
        // 4000 samples: 64 MB of distances and 3 x 72 MB of consensus counters cannot fit a 64 MB heap
        var sb = new StringBuilder("id,a,b\n");
        var rng = new java.util.SplittableRandom(1);
        for (int i = 0; i < 4000; i++) {
            sb.append("s").append(i).append(',').append(rng.nextDouble()).append(',').append(rng.nextDouble()).append('\n');
        }
        Files.writeString(tmp.resolve("big.csv"), sb);
        Jar.Result r = Jar.run(tmp, List.of("-Xmx64m"), "assess", "big.csv", "--out", "big-out");
        assertEquals(3, r.exit(), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertTrue(r.err().contains("-Xmx"), r.err());
        assertFalse(r.err().contains("OutOfMemoryError"));
        assertFalse(Files.exists(tmp.resolve("big-out")));
    }

    @Test
    void hostileIdsAreEscapedInHtmlAndNeutralisedInCsv() throws Exception {
        var sb = new StringBuilder("id,\"<b>f&1</b>\",f2\n");
        var rng = new java.util.SplittableRandom(3);
        String[] hostile = {"<script>alert(1)</script>", "=HYPERLINK(\"http://x\")", "+1+1", "@SUM(A1)", "-2+3",
            "\"quoted\"", "a&b"};
        for (int i = 0; i < 30; i++) {
            String id = i < hostile.length ? hostile[i] : "s" + i;
            sb.append('"').append(id.replace("\"", "\"\"")).append('"');
            double c = i % 2 == 0 ? 0 : 10;
            sb.append(',').append(c + rng.nextDouble()).append(',').append(c + rng.nextDouble()).append('\n');
        }
        Files.writeString(tmp.resolve("<x>&y.csv"), sb);
        Jar.Result r = Jar.run(tmp, "assess", "<x>&y.csv", "--out", "safe", "--no-progress", "--replicates", "20",
                "--null-replicates", "3", "--reference-sets", "5", "--max-k", "4");
        assertEquals(0, r.exit(), r.err());
        Document html = Jsoup.parse(tmp.resolve("safe/report.html").toFile(), "UTF-8");
        assertTrue(html.select("script").isEmpty(), "no script element");
        assertTrue(html.text().contains("<x>&y.csv"), "file name shown as text");
        String raw = Files.readString(tmp.resolve("safe/report.html"));
        assertFalse(raw.contains("<script>alert(1)</script>"));
        List<CSVRecord> rows = csv(tmp.resolve("safe/clusters.csv"));
        var ids = rows.stream().map(c -> c.get("sample")).toList();
        assertTrue(ids.contains("'=HYPERLINK(\"http://x\")"), ids.toString());
        assertTrue(ids.contains("'+1+1") && ids.contains("'@SUM(A1)") && ids.contains("'-2+3"), ids.toString());
        assertTrue(ids.contains("\"quoted\"") && ids.contains("a&b"), ids.toString());
    }

    private static JsonNode chosen(JsonNode s) {
        JsonNode rec = s.get("recommendation");
        for (JsonNode l : s.get("linkages")) {
            if (l.get("linkage").asText().equals(rec.get("linkage").asText())) {
                return l.get("byK").get(rec.get("k").asInt() - 2);
            }
        }
        throw new AssertionError("no evidence for the recommended linkage");
    }

    private static String[] cat(String[] a, String... b) {
        String[] out = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }

    private static List<CSVRecord> csv(Path file) throws IOException {
        try (var p = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(Files.newBufferedReader(file))) {
            return p.getRecords();
        }
    }

    private static List<String> header(Path file) throws IOException {
        return List.of(Files.readAllLines(file).get(0).split(","));
    }
}
