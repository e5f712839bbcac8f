package org.treeproof.tree;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.partition.Partition;

/** Shared helpers of the tree tests: reference fixtures, Euclidean distances, tolerant comparisons. */
final class TreeFixtures {
    private TreeFixtures() {
    }

    static JsonNode json(String resource) {
        try (InputStream in = open(resource)) {
            return new ObjectMapper().readTree(in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Fisher's Iris measurements (150 × 4), as committed under reference/iris.csv. */
    static double[][] iris() {
        try (Reader r = new InputStreamReader(open("/reference/iris.csv"), StandardCharsets.UTF_8)) {
            List<double[]> rows = new ArrayList<>();
            for (CSVRecord rec : CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(r)) {
                double[] row = new double[4];
                for (int f = 0; f < 4; f++) {
                    row[f] = Double.parseDouble(rec.get(f));
                }
                rows.add(row);
            }
            return rows.toArray(new double[0][]);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static double[][] matrix(JsonNode rows) {
        double[][] x = new double[rows.size()][];
        for (int i = 0; i < x.length; i++) {
            JsonNode row = rows.get(i);
            x[i] = new double[row.size()];
            for (int f = 0; f < x[i].length; f++) {
                x[i][f] = row.get(f).doubleValue();
            }
        }
        return x;
    }

    /**
     * Euclidean distances summing squared differences feature by feature in order; the reference script
     * checks that this loop reproduces scipy's pdist bit for bit, so both sides cluster the same doubles.
     */
    static CondensedDistances euclidean(double[][] x) {
        int n = x.length;
        double[] d = new double[CondensedDistances.length(n)];
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

    static int[] ints(JsonNode array) {
        int[] v = new int[array.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = array.get(i).intValue();
        }
        return v;
    }

    static Partition partition(JsonNode labels) {
        return Partition.of(ints(labels));
    }

    /** {@code |a - e| <= rel · max(|a|, |e|)}, so zero matches only zero. */
    static void assertRelative(double expected, double actual, double rel, String what) {
        double scale = Math.max(Math.abs(expected), Math.abs(actual));
        assertTrue(Math.abs(actual - expected) <= rel * scale,
                () -> what + ": expected " + expected + " but was " + actual);
    }

    static void assertSameMerges(JsonNode merges, MergeTree tree, String what) {
        assertEquals(merges.size(), tree.merges(), what + ": merge count");
        for (int s = 0; s < tree.merges(); s++) {
            JsonNode row = merges.get(s);
            assertEquals(row.get(0).intValue(), tree.left(s), what + ": left of merge " + s);
            assertEquals(row.get(1).intValue(), tree.right(s), what + ": right of merge " + s);
            assertEquals(row.get(3).intValue(), tree.size(s), what + ": size of merge " + s);
        }
    }

    private static InputStream open(String resource) {
        InputStream in = TreeFixtures.class.getResourceAsStream(resource);
        if (in == null) {
            throw new IllegalStateException("missing test resource " + resource);
        }
        return in;
    }
}
