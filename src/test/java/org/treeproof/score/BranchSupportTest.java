package org.treeproof.score;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.tree.Linkage;
import org.treeproof.tree.MergeTree;

class BranchSupportTest {

    /**
     * Hand example: six points on a line at 0, 1, 10, 11, 30, 31. Single linkage on all six has the clades
     * {0,1} {2,3} {4,5} {0,1,2,3} {all}. A replicate holding samples 0, 2, 3, 4 at the same positions has the
     * tree ((2,3),0),4 and so the clades {2,3} {0,2,3} {0,2,3,4}. Restricted to the replicate:
     * {0,1} -> {0}: one member, not counted; {2,3} -> {2,3}: counted, reproduced; {4,5} -> {4}: not counted;
     * {0,1,2,3} -> {0,2,3}: counted, reproduced; {all} -> {0,2,3,4}: counted, reproduced (the root).
     */
    @Test
    void handExampleOnALine() {
        double[] x = {0, 1, 10, 11, 30, 31};
        MergeTree ref = Linkage.SINGLE.cluster(line(x));
        int[] draws = {0, 2, 3, 4};
        MergeTree rep = Linkage.SINGLE.cluster(line(new double[] {0, 10, 11, 30}));
        var bs = BranchSupport.of(ref, 99);
        BranchSupport.Replicate r = bs.score(draws, rep);
        for (int s = 0; s < ref.merges(); s++) {
            Set<Integer> clade = set(ref.cladeMembers(s));
            clade.retainAll(Set.of(0, 2, 3, 4));
            boolean counted = clade.size() >= 2;
            assertEquals(counted, r.counted(s), "merge " + s);
            assertEquals(counted, r.supported(s), "merge " + s);
        }
    }

    @Test
    void aSplitThatTheReplicateDoesNotReproduceIsCountedButNotSupported() {
        // reference: {0,1} then {2,3}; replicate moves sample 1 next to 2 and 3 (which still pair first): {0,1} is not reproduced, {2,3} is
        MergeTree ref = Linkage.SINGLE.cluster(line(new double[] {0, 1, 10, 11}));
        MergeTree rep = Linkage.SINGLE.cluster(line(new double[] {0, 9.5, 10.2, 10.4}));
        var r = BranchSupport.of(ref, 1).score(new int[] {0, 1, 2, 3}, rep);
        int s01 = cladeIndex(ref, Set.of(0, 1));
        int s23 = cladeIndex(ref, Set.of(2, 3));
        assertTrue(r.counted(s01));
        assertTrue(!r.supported(s01));
        assertTrue(r.supported(s23));
    }

    /** Seeded invariant: the hash comparison equals an explicit set comparison, also with bootstrap repeats. */
    @Test
    void hashingAgreesWithExplicitSetsOnRandomTreesWithRepeats() {
        var rng = new SplittableRandom(5);
        for (int round = 0; round < 200; round++) {
            int n = 3 + rng.nextInt(30);
            double[] x = new double[n];
            for (int i = 0; i < n; i++) {
                x[i] = rng.nextDouble();
            }
            MergeTree ref = Linkage.AVERAGE.cluster(line(x));
            int m = 2 + rng.nextInt(n);
            int[] draws = new int[m];
            for (int a = 0; a < m; a++) {
                draws[a] = rng.nextInt(n);
            }
            Arrays.sort(draws);
            double[] y = new double[m];
            for (int a = 0; a < m; a++) {
                y[a] = x[draws[a]] + 0.05 * rng.nextDouble();
            }
            MergeTree rep = Linkage.AVERAGE.cluster(line(y));
            var r = BranchSupport.of(ref, round).score(draws, rep);
            Set<Set<Integer>> repClades = new HashSet<>();
            for (int s = 0; s < rep.merges(); s++) {
                Set<Integer> c = new HashSet<>();
                for (int leaf : rep.cladeMembers(s)) {
                    c.add(draws[leaf]);
                }
                // a replicate clade stands for a sample set only when it holds every copy of its samples
                boolean complete = true;
                for (int sample : c) {
                    long inClade = Arrays.stream(rep.cladeMembers(s)).filter(leaf -> draws[leaf] == sample).count();
                    long all = Arrays.stream(draws).filter(d -> d == sample).count();
                    complete &= inClade == all;
                }
                if (complete) {
                    repClades.add(c);
                }
            }
            Set<Integer> held = set(draws);
            for (int s = 0; s < ref.merges(); s++) {
                Set<Integer> c = set(ref.cladeMembers(s));
                c.retainAll(held);
                assertEquals(c.size() >= 2, r.counted(s));
                assertEquals(c.size() >= 2 && repClades.contains(c), r.supported(s), "round " + round + " merge " + s);
            }
        }
    }

    @Test
    void tallyGivesSharesAndNanForNeverCounted() {
        MergeTree ref = Linkage.SINGLE.cluster(line(new double[] {0, 1, 10, 11}));
        var bs = BranchSupport.of(ref, 3);
        var tally = new BranchSupport.Tally(ref.merges());
        tally.add(bs.score(new int[] {0, 1, 2, 3}, ref));
        tally.add(bs.score(new int[] {0, 2, 3}, Linkage.SINGLE.cluster(line(new double[] {0, 10, 11}))));
        double[] support = tally.support();
        assertEquals(1.0, support[cladeIndex(ref, Set.of(0, 1))]);
        assertEquals(2, tally.counted()[cladeIndex(ref, Set.of(2, 3))]);
        var empty = new BranchSupport.Tally(3);
        assertTrue(Double.isNaN(empty.support()[0]));
    }

    @Test
    void modularArithmeticIsExact() {
        long p = (1L << 61) - 1;
        for (long a : new long[] {1, 2, 3, 12345, p - 1, 1L << 60}) {
            assertEquals(1, BranchSupport.mulMod(a, BranchSupport.inverse(a)));
            assertEquals(java.math.BigInteger.valueOf(a).multiply(java.math.BigInteger.valueOf(p - 2))
                    .mod(java.math.BigInteger.valueOf(p)).longValue(), BranchSupport.mulMod(a, p - 2));
        }
    }

    private static int cladeIndex(MergeTree t, Set<Integer> members) {
        for (int s = 0; s < t.merges(); s++) {
            if (set(t.cladeMembers(s)).equals(members)) {
                return s;
            }
        }
        throw new AssertionError("no clade " + members);
    }

    private static Set<Integer> set(int[] a) {
        Set<Integer> s = new HashSet<>();
        for (int v : a) {
            s.add(v);
        }
        return s;
    }

    private static CondensedDistances line(double[] x) {
        int n = x.length;
        double[] c = new double[n * (n - 1) / 2];
        int t = 0;
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                c[t++] = Math.abs(x[i] - x[j]);
            }
        }
        return CondensedDistances.of(n, c);
    }
}
