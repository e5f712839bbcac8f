package org.treeproof.tree;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.treeproof.data.InputException;
import org.treeproof.distance.CondensedDistances;

class LinkageTest {

    @Test
    void parsesNamesAndAliasesCaseInsensitively() {
        assertSame(Linkage.AVERAGE, Linkage.parse("average"));
        assertSame(Linkage.AVERAGE, Linkage.parse("UPGMA"));
        assertSame(Linkage.WEIGHTED, Linkage.parse("wpgma"));
        assertSame(Linkage.WARD, Linkage.parse(" Ward "));
        for (Linkage l : Linkage.values()) {
            assertSame(l, Linkage.parse(l.id()));
            assertEquals(l.name().toLowerCase(java.util.Locale.ROOT), l.id());
        }
    }

    @Test
    void unknownNameListsTheValidOnesOnOneLine() {
        InputException e = assertThrows(InputException.class, () -> Linkage.parse("wards"));
        String m = e.getMessage();
        assertTrue(m.contains("'wards'"), m);
        for (Linkage l : Linkage.values()) {
            assertTrue(m.contains(l.id()), m);
        }
        assertTrue(m.contains("upgma") && m.contains("wpgma"), m);
        assertFalse(m.contains("\n"));
    }

    @Test
    void flags() {
        EnumSet<Linkage> euclidean = EnumSet.of(Linkage.WARD, Linkage.CENTROID, Linkage.MEDIAN);
        EnumSet<Linkage> inverting = EnumSet.of(Linkage.CENTROID, Linkage.MEDIAN);
        for (Linkage l : Linkage.values()) {
            assertEquals(euclidean.contains(l), l.requiresEuclidean(), l.id());
            assertEquals(!inverting.contains(l), l.monotone(), l.id());
        }
    }

    /**
     * The coefficient table of Lance and Williams (1967), doi:10.1093/comjnl/9.4.373, as tabulated by
     * Müllner (2011), arXiv:1109.2378, Table 1, merging i and j, seen from k.
     */
    @Test
    void lanceWilliamsCoefficients() {
        assertEquals(new LanceWilliams(0.5, 0.5, 0, -0.5), Linkage.SINGLE.coefficients(2, 3, 4));
        assertEquals(new LanceWilliams(0.5, 0.5, 0, 0.5), Linkage.COMPLETE.coefficients(2, 3, 4));
        assertEquals(new LanceWilliams(0.4, 0.6, 0, 0), Linkage.AVERAGE.coefficients(2, 3, 4));
        assertEquals(new LanceWilliams(0.5, 0.5, 0, 0), Linkage.WEIGHTED.coefficients(2, 3, 4));
        // ward: (ni+nk)/(ni+nj+nk), (nj+nk)/(...), -nk/(...)
        assertEquals(new LanceWilliams(6.0 / 9, 7.0 / 9, -4.0 / 9, 0), Linkage.WARD.coefficients(2, 3, 4));
        // centroid: ni/(ni+nj), nj/(ni+nj), -ni·nj/(ni+nj)²
        assertEquals(new LanceWilliams(0.4, 0.6, -0.24, 0), Linkage.CENTROID.coefficients(2, 3, 4));
        assertEquals(new LanceWilliams(0.5, 0.5, -0.25, 0), Linkage.MEDIAN.coefficients(2, 3, 4));
    }

    /** The specialised update of each constant computes the general formula (on squares where required). */
    @Test
    void fastUpdateAgreesWithTheGeneralFormula() {
        SplittableRandom rnd = new SplittableRandom(17);
        int m = 64;
        for (Linkage l : Linkage.values()) {
            for (int rep = 0; rep < 50; rep++) {
                // distances between clusters of points on a line, so squared recurrences stay non-negative
                int nx = 1 + rnd.nextInt(20);
                int ny = 1 + rnd.nextInt(20);
                double cx = rnd.nextDouble() * 10;
                double cy = rnd.nextDouble() * 10;
                double dxy = Math.abs(cx - cy);
                double[] dx = new double[m];
                double[] dy = new double[m];
                int[] nk = new int[m];
                double[] expected = new double[m];
                for (int r = 0; r < m; r++) {
                    double ck = rnd.nextDouble() * 30 - 10;
                    dx[r] = Math.abs(ck - cx);
                    dy[r] = Math.abs(ck - cy);
                    nk[r] = 1 + rnd.nextInt(20);
                    LanceWilliams c = l.coefficients(nx, ny, nk[r]);
                    expected[r] = l.requiresEuclidean()
                            ? Math.sqrt(Math.max(0, c.apply(dx[r] * dx[r], dy[r] * dy[r], dxy * dxy)))
                            : c.apply(dx[r], dy[r], dxy);
                }
                l.update(dx, dy, dxy, nx, ny, nk, m);
                for (int r = 0; r < m; r++) {
                    assertEquals(expected[r], dy[r], 1e-12 * Math.max(1, expected[r]), l.id());
                }
            }
        }
    }

    @Test
    void degenerateSizes() {
        for (Linkage l : Linkage.values()) {
            MergeTree one = l.cluster(CondensedDistances.of(1, new double[0]));
            assertEquals(0, one.merges());
            assertEquals(1, one.cutAtK(1).partition().clusterCount());
            MergeTree two = l.cluster(CondensedDistances.of(2, new double[] {3.5}));
            assertEquals(0, two.left(0));
            assertEquals(1, two.right(0));
            assertEquals(3.5, two.height(0));
            MergeTree same = l.cluster(CondensedDistances.of(3, new double[] {0, 0, 0}));
            assertEquals(0, same.height(1), l.id());
            assertEquals(2, same.size(0));
        }
    }
}
