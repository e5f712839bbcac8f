package org.treeproof.score;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import org.junit.jupiter.api.Test;

/** The multiscale-bootstrap fit against hand-worked cases and the published formula computed by numpy/scipy. */
class MultiscaleFitTest {

    /**
     * Hand-worked: a branch found in exactly half the replicates at every scale has z = 0 everywhere, so
     * v = c = 0 fit exactly (chi-square 0) and au = bp = 1 − Φ(0) = 1/2. Its standard errors by hand: at each scale
     * var z = (1/4) / (B φ(0)²) = π / (2B); with B = 100 and scales 0.5, 1, 2 the weighted normal matrix is
     * (200/π)·[[3.5, 3], [3, 3.5]], whose inverse has v-v and c-c entries 3.5 k, v-c entry −3 k with
     * k = π / (200 · 3.25); se(au) = φ(0)·√(3.5k + 3.5k + 6k) = φ(0)·√(13k) = φ(0)·√(2π/100) = 0.1 (and
     * se(bp) = φ(0)·√(k) = √(1/1300)).
     */
    @Test
    void halfAtEveryScaleGivesOneHalf() {
        var r = MultiscaleFit.of(new double[] {0.5, 1, 2}, new int[] {100, 100, 100}, new int[] {50, 50, 50})
                .compute();
        assertEquals(MultiscaleFit.Status.FITTED, r.status());
        assertEquals(0.5, r.au(), 1e-12);
        assertEquals(0.5, r.bp(), 1e-12);
        assertEquals(0, r.chiSquare(), 1e-20);
        assertEquals(1, r.df());
        assertEquals(0.1, r.auSE(), 1e-12);
        assertEquals(Math.sqrt(1.0 / 1300), r.bpSE(), 1e-12);
    }

    /** Cases computed from the published formula by {@code reference/multiscale/au_fit_reference.py}. */
    @Test
    void matchesThePublishedFormulaComputedWithScipy() throws IOException {
        JsonNode root = fixture();
        int checked = 0;
        for (JsonNode c : root.get("cases")) {
            String name = c.get("name").asText();
            var r = MultiscaleFit.of(doubles(c.get("scales")), ints(c.get("replicates")), ints(c.get("counts")))
                    .compute();
            JsonNode e = c.get("expected");
            assertEquals(e.get("scalesUsed").asInt(), r.scalesUsed(), name);
            assertEquals(e.get("df").asInt(), r.df(), name);
            assertEquals(e.get("v").asDouble(), r.v(), 1e-9, name);
            assertEquals(e.get("c").asDouble(), r.c(), 1e-9, name);
            assertEquals(e.get("chiSquare").asDouble(), r.chiSquare(), 1e-8 * Math.max(1, r.chiSquare()), name);
            if (e.get("fitPValue").asDouble() < MultiscaleFit.POOR_FIT_P) {
                assertEquals(MultiscaleFit.Status.POOR_FIT, r.status(), name);
                assertTrue(Double.isNaN(r.au()) && Double.isNaN(r.bp()), name);
                assertTrue(r.reason().contains("poorly"), name);
            } else {
                assertEquals(MultiscaleFit.Status.FITTED, r.status(), name);
                assertEquals(e.get("au").asDouble(), r.au(), 1e-9, name);
                assertEquals(e.get("bp").asDouble(), r.bp(), 1e-9, name);
                assertEquals(e.get("auSE").asDouble(), r.auSE(), 1e-9, name);
                assertEquals(e.get("bpSE").asDouble(), r.bpSE(), 1e-9, name);
                assertEquals(e.get("fitPValue").asDouble(), r.fitPValue(), 1e-7, name);
            }
            checked++;
        }
        assertEquals(4, checked);
    }

    @Test
    void degenerateCountsGiveNoNumberAndSayWhy() {
        double[] scales = {0.5, 0.75, 1, 1.25};
        int[] b = {20, 20, 20, 20};
        var always = MultiscaleFit.of(scales, b, new int[] {20, 20, 20, 20}).compute();
        assertEquals(MultiscaleFit.Status.ALWAYS, always.status());
        assertTrue(Double.isNaN(always.au()) && Double.isNaN(always.auSE()));
        assertFalse(always.reason().isEmpty());
        var never = MultiscaleFit.of(scales, b, new int[] {0, 0, 0, 0}).compute();
        assertEquals(MultiscaleFit.Status.NEVER, never.status());
        assertTrue(Double.isNaN(never.bp()));
        var few = MultiscaleFit.of(scales, b, new int[] {0, 3, 20, 20}).compute();
        assertEquals(MultiscaleFit.Status.TOO_FEW_SCALES, few.status());
        assertEquals(1, few.scalesUsed());
        assertTrue(few.reason().contains("only 1 of 4"), few.reason());
    }

    /**
     * Three scales close together, each with 1 of 20 replicates: the model fits (chi-square p about 0.997), but (v, c)
     * are barely determined; the published formula (the fit function of au_fit_reference.py, run by hand) gives
     * au = 0.498 with a delta-method standard error of 2.66, more than a share can have, so no number is given.
     */
    @Test
    void aFitThatDoesNotDetermineAuGivesNoNumber() {
        var r = MultiscaleFit.of(new double[] {0.9, 1.0, 1.1}, new int[] {20, 20, 20}, new int[] {1, 1, 1}).compute();
        assertEquals(MultiscaleFit.Status.UNDETERMINED, r.status(), r.toString());
        assertTrue(Double.isNaN(r.au()) && Double.isNaN(r.auSE()));
        assertTrue(r.reason().contains("does not determine"), r.reason());
        assertTrue(r.fitPValue() > 0.99);
    }

    @Test
    void refusesCountsOutsideTheirReplicates() {
        assertThrows(IllegalArgumentException.class,
                () -> MultiscaleFit.of(new double[] {1}, new int[] {10}, new int[] {11}));
        assertThrows(IllegalArgumentException.class,
                () -> MultiscaleFit.of(new double[] {0}, new int[] {10}, new int[] {1}));
    }

    static JsonNode fixture() throws IOException {
        try (InputStream in = MultiscaleFitTest.class.getResourceAsStream("/reference/multiscale/au_fit_reference.json")) {
            return new ObjectMapper().readTree(in);
        }
    }

    static double[] doubles(JsonNode a) {
        double[] v = new double[a.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = a.get(i).asDouble();
        }
        return v;
    }

    static int[] ints(JsonNode a) {
        int[] v = new int[a.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = a.get(i).asInt();
        }
        return v;
    }
}
