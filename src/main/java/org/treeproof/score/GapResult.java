package org.treeproof.score;

import java.util.Arrays;

/**
 * The gap statistic for k = 1..K and the number of clusters its rule picks; see {@link GapStatistic}.
 *
 * <p>Every array has one entry per k, entry {@code k − 1} for k clusters. Arrays are copied in and out.
 *
 * @param logW              log W_k of the observed data (natural logarithm)
 * @param referenceMeanLogW (1/B) Σ_b log W*_kb, the paper's E*_n{log W_k}
 * @param gap               Gap(k) = referenceMeanLogW − logW
 * @param sd                sd_k = [(1/B) Σ_b (log W*_kb − mean)²]^{1/2}, the population SD over b
 * @param se                s_k = sd_k · sqrt(1 + 1/B), the allowance the rule uses
 * @param referenceSets     B, the number of reference data sets
 * @param chosenK           the smallest k &lt; K with Gap(k) ≥ Gap(k+1) − s_{k+1}, or K when none has it
 * @param ruleMet           false when no k &lt; K met the rule and {@code chosenK} is K only because the range
 *                          ran out: the data may hold more clusters than were examined
 */
public record GapResult(double[] logW, double[] referenceMeanLogW, double[] gap, double[] sd, double[] se,
        int referenceSets, int chosenK, boolean ruleMet) {

    public GapResult {
        logW = logW.clone();
        referenceMeanLogW = referenceMeanLogW.clone();
        gap = gap.clone();
        sd = sd.clone();
        se = se.clone();
        int k = logW.length;
        if (k < 1) {
            throw new IllegalArgumentException("no k values");
        }
        if (referenceMeanLogW.length != k || gap.length != k || sd.length != k || se.length != k) {
            throw new IllegalArgumentException("arrays must all have length " + k);
        }
        if (referenceSets < 1) {
            throw new IllegalArgumentException("referenceSets must be positive, got " + referenceSets);
        }
        if (chosenK < 1 || chosenK > k) {
            throw new IllegalArgumentException("chosenK " + chosenK + " outside 1.." + k);
        }
        if (!ruleMet && chosenK != k) {
            throw new IllegalArgumentException("when the rule is not met the choice is K = " + k);
        }
        for (int i = 0; i < k; i++) {
            if (!Double.isFinite(logW[i]) || !Double.isFinite(referenceMeanLogW[i]) || !Double.isFinite(gap[i])
                    || !(sd[i] >= 0) || !(se[i] >= 0) || Double.isInfinite(sd[i]) || Double.isInfinite(se[i])) {
                throw new IllegalArgumentException("non-finite or negative value at k = " + (i + 1));
            }
        }
    }

    /** K, the largest number of clusters examined. */
    public int maxK() {
        return logW.length;
    }

    /** Gap(k) for 1 ≤ k ≤ K. */
    public double gapAt(int k) {
        return gap[index(k)];
    }

    /** s_k for 1 ≤ k ≤ K. */
    public double seAt(int k) {
        return se[index(k)];
    }

    private int index(int k) {
        if (k < 1 || k > logW.length) {
            throw new IndexOutOfBoundsException("k = " + k + " outside 1.." + logW.length);
        }
        return k - 1;
    }

    @Override
    public double[] logW() {
        return logW.clone();
    }

    @Override
    public double[] referenceMeanLogW() {
        return referenceMeanLogW.clone();
    }

    @Override
    public double[] gap() {
        return gap.clone();
    }

    @Override
    public double[] sd() {
        return sd.clone();
    }

    @Override
    public double[] se() {
        return se.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof GapResult g && g.referenceSets == referenceSets && g.chosenK == chosenK
                && g.ruleMet == ruleMet && Arrays.equals(g.logW, logW)
                && Arrays.equals(g.referenceMeanLogW, referenceMeanLogW) && Arrays.equals(g.gap, gap)
                && Arrays.equals(g.sd, sd) && Arrays.equals(g.se, se);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * Arrays.hashCode(gap) + Arrays.hashCode(se)) + chosenK;
    }

    @Override
    public String toString() {
        return "GapResult[K=" + logW.length + ", B=" + referenceSets + ", k=" + chosenK
                + (ruleMet ? "" : " (rule not met below K)") + ", gap=" + Arrays.toString(gap) + "]";
    }
}
