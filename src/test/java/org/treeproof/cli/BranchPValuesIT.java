package org.treeproof.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code --branch-pvalues} end to end from the jar: the summary.json contract (au, auSE, bp, bpSE per branch; the
 * consensus CDF and its change in area per k), the report and charts, identical bytes for any thread count, and a
 * run killed during the multiscale bootstrap resuming to the same summary.
 */
class BranchPValuesIT {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Path TABLE = Path.of("demo-data", "nested-strains.csv").toAbsolutePath();
    private static final String[] SMALL = {"--log2", "--no-progress", "--replicates", "20", "--null-sets", "19",
        "--reference-sets", "0", "--max-k", "6", "--branch-pvalues", "--branch-replicates", "20"};

    @TempDir
    Path tmp;

    private String[] args(String out, String... extra) {
        var a = new ArrayList<>(List.of("assess", TABLE.toString(), "--out", out));
        a.addAll(List.of(SMALL));
        a.addAll(List.of(extra));
        return a.toArray(String[]::new);
    }

    @Test
    void summaryCarriesBranchPValuesAndTheConsensusCdf() throws Exception {
        Jar.Result r = Jar.run(tmp, args("out", "--threads", "1"));
        assertEquals(0, r.exit(), r.err());
        JsonNode s = JSON.readTree(tmp.resolve("out/summary.json").toFile());
        assertEquals(20, s.get("settings").get("branchPValues").get("replicatesPerScale").asInt());
        int fitted = 0;
        for (JsonNode le : s.get("linkages")) {
            for (JsonNode b : le.get("branchSupport")) {
                for (String f : List.of("au", "auSE", "bp", "bpSE")) {
                    JsonNode v = b.get(f);
                    assertTrue(v != null && (v.isNull() || (v.asDouble() >= 0 && v.asDouble() <= 1)), f + " " + b);
                }
                String status = b.get("pvalueFit").get("status").asText();
                if (b.get("au").isNull()) {
                    assertFalse(b.get("pvalueFit").get("note").asText().isEmpty(), "a missing au says why: " + b);
                } else {
                    assertEquals("fitted", status);
                    fitted++;
                }
            }
            for (JsonNode k : le.get("byK")) {
                JsonNode cdf = k.get("consensusCdf");
                assertTrue(cdf.size() >= 1);
                double lastX = -1;
                double lastF = 0;
                for (JsonNode p : cdf) {
                    assertTrue(p.get(0).asDouble() > lastX && p.get(1).asDouble() >= lastF, "increasing: " + p);
                    lastX = p.get(0).asDouble();
                    lastF = p.get(1).asDouble();
                }
                assertEquals(1.0, lastF, 0);
                assertTrue(k.get("deltaArea").isNumber() || k.get("deltaArea").isNull());
            }
            assertEquals(le.get("byK").get(0).get("consensusArea").asDouble(),
                    le.get("byK").get(0).get("deltaArea").asDouble(), 0, "at k = 2 the change is the area");
        }
        assertTrue(fitted > 0);
        // the four planted strains are supported, so the recommended clusters' branches are reported
        assertEquals(4, s.get("recommendation").get("k").asInt(), s.get("recommendation").toString());
        {
            assertEquals(s.get("recommendation").get("k").asInt(),
                    s.get("recommendation").get("clusterBranches").size());
            String html = Files.readString(tmp.resolve("out/report.html"));
            assertTrue(html.contains("table class=\"branches\""), "the report lists the clusters' branches");
            // methods.md's result gives every cluster's AU p-value as summary.json has it, and names the low ones
            String md = Files.readString(tmp.resolve("out/methods.md"));
            assertTrue(md.contains("AU p-values of the recommended clusters' branches: "), md);
            for (JsonNode b : s.get("recommendation").get("clusterBranches")) {
                String au = b.get("au").isNull() ? "none (" : String.format(java.util.Locale.ROOT, "%.3f ± %.3f",
                        b.get("au").asDouble(), b.get("auSE").asDouble());
                assertTrue(md.contains("cluster " + b.get("id").asInt() + " " + au), b + " in\n" + md);
                assertEquals(b.get("lowAu").asBoolean(), md.matches("(?s).*Clusters? [0-9, and]*\\b"
                        + b.get("id").asInt() + "\\b[0-9, and]* (is|are) flagged: below an AU p-value.*"), b + "\n" + md);
            }
        }
        assertTrue(Files.size(tmp.resolve("out/charts/consensus-cdf.png")) > 0);
        assertTrue(Files.readString(tmp.resolve("out/methods.md")).contains("approximately unbiased (AU) p-value"));
    }

    @Test
    void identicalForAnyThreadCountAndAfterAResume() throws Exception {
        assertEquals(0, Jar.run(tmp, args("t1", "--threads", "1")).exit());
        assertEquals(0, Jar.run(tmp, args("t2", "--threads", "2")).exit());
        byte[] one = Files.readAllBytes(tmp.resolve("t1/summary.json"));
        assertArrayEquals(one, Files.readAllBytes(tmp.resolve("t2/summary.json")));
        // killed abruptly after 75 of the 200 multiscale replicates were kept
        Jar.Result killed = Jar.run(tmp, List.of("-Dtreeproof.faultAfterMultiscale=75"), args("resumed", "--threads", "2"));
        assertEquals(137, killed.exit(), killed.err());
        Jar.Result resumed = Jar.run(tmp, args("resumed", "--threads", "2", "--resume"));
        assertEquals(0, resumed.exit(), resumed.err());
        assertArrayEquals(one, Files.readAllBytes(tmp.resolve("resumed/summary.json")));
    }
}
