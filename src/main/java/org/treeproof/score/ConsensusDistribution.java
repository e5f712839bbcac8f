package org.treeproof.score;

import java.math.BigDecimal;
import java.util.Arrays;
import java.util.Objects;

/**
 * The exact empirical distribution of consensus values at one k, over the item pairs {@code i < j}
 * that were co-sampled at least once (pairs never co-sampled have no consensus value and are left out).
 *
 * <p>Each consensus value is a fraction co-clustered / co-sampled; the distribution lists the distinct
 * values as reduced fractions in increasing order with the number of pairs at each. Comparisons with
 * a bound are made on the fractions, exactly: a consensus of exactly 1/10 is never mistaken for one
 * just above or below 0.1.
 *
 * <p>PAC, the proportion of ambiguous clustering, is the share of pairs with
 * {@code lower < consensus ≤ upper}, by default {@code (0.1, 0.9]}: Y. Şenbabaoğlu, G. Michailidis and
 * J. Z. Li, "Critical limitations of consensus clustering in class discovery", Scientific Reports 4
 * (2014) 6207, doi:10.1038/srep06207. A pair at exactly 0.1 is not ambiguous; one at exactly 0.9 is.
 *
 * @param k            the number of clusters
 * @param numerators   reduced numerator of each distinct value
 * @param denominators reduced denominator of each distinct value
 * @param counts       pairs with each value, all positive
 */
public record ConsensusDistribution(int k, int[] numerators, int[] denominators, long[] counts) {
    /** The default lower PAC bound, exclusive: one tenth. */
    public static final BigDecimal DEFAULT_PAC_LOWER = new BigDecimal("0.1");
    /** The default upper PAC bound, inclusive: nine tenths. */
    public static final BigDecimal DEFAULT_PAC_UPPER = new BigDecimal("0.9");

    public ConsensusDistribution {
        numerators = numerators.clone();
        denominators = denominators.clone();
        counts = counts.clone();
        if (numerators.length != denominators.length || numerators.length != counts.length) {
            throw new IllegalArgumentException("numerators, denominators and counts differ in length");
        }
        for (int t = 0; t < counts.length; t++) {
            int num = numerators[t];
            int den = denominators[t];
            if (den < 1 || num < 0 || num > den || gcd(num, den) != 1 || counts[t] < 1) {
                throw new IllegalArgumentException("entry " + t + " (" + num + "/" + den + ", " + counts[t]
                        + " pairs) is not a reduced fraction in [0, 1] with a positive count");
            }
            if (t > 0 && (long) numerators[t - 1] * den >= (long) num * denominators[t - 1]) {
                throw new IllegalArgumentException("values are not strictly increasing at entry " + t);
            }
        }
    }

    static int gcd(int a, int b) {
        while (b != 0) {
            int t = a % b;
            a = b;
            b = t;
        }
        return a;
    }

    @Override
    public int[] numerators() {
        return numerators.clone();
    }

    @Override
    public int[] denominators() {
        return denominators.clone();
    }

    @Override
    public long[] counts() {
        return counts.clone();
    }

    /** The number of pairs described (co-sampled at least once). */
    public long pairs() {
        long s = 0;
        for (long c : counts) {
            s += c;
        }
        return s;
    }

    /** The distinct consensus values, increasing. */
    public double[] values() {
        double[] v = new double[counts.length];
        for (int t = 0; t < v.length; t++) {
            v[t] = (double) numerators[t] / denominators[t];
        }
        return v;
    }

    /** The empirical CDF at each distinct value: the share of pairs with consensus at most that value. */
    public double[] cumulativeShares() {
        double total = pairs();
        double[] f = new double[counts.length];
        long run = 0;
        for (int t = 0; t < f.length; t++) {
            run += counts[t];
            f[t] = run / total;
        }
        return f;
    }

    /** The empirical CDF at {@code x}, decided exactly; {@code NaN} when there are no pairs. */
    public double shareAtMost(BigDecimal x) {
        Objects.requireNonNull(x, "x");
        Bound b = new Bound(x);
        long at = 0;
        // values increase, so the first above x ends the sum
        for (int t = 0; t < counts.length && b.compare(numerators[t], denominators[t]) <= 0; t++) {
            at += counts[t];
        }
        long total = pairs();
        return total == 0 ? Double.NaN : (double) at / total;
    }

    /** PAC over the default interval {@code (0.1, 0.9]}. */
    public double pac() {
        return pac(DEFAULT_PAC_LOWER, DEFAULT_PAC_UPPER);
    }

    /**
     * PAC, the share of pairs with {@code lower < consensus ≤ upper}, decided exactly; {@code NaN}
     * when there are no pairs.
     *
     * @throws IllegalArgumentException unless {@code 0 ≤ lower < upper ≤ 1}
     */
    public double pac(BigDecimal lower, BigDecimal upper) {
        Objects.requireNonNull(lower, "lower");
        Objects.requireNonNull(upper, "upper");
        if (lower.signum() < 0 || lower.compareTo(upper) >= 0 || upper.compareTo(BigDecimal.ONE) > 0) {
            throw new IllegalArgumentException("PAC bounds must satisfy 0 <= lower < upper <= 1, got ("
                    + lower + ", " + upper + "]");
        }
        Bound low = new Bound(lower);
        Bound high = new Bound(upper);
        long ambiguous = 0;
        for (int t = 0; t < counts.length; t++) {
            if (low.compare(numerators[t], denominators[t]) > 0 && high.compare(numerators[t], denominators[t]) <= 0) {
                ambiguous += counts[t];
            }
        }
        long total = pairs();
        return total == 0 ? Double.NaN : (double) ambiguous / total;
    }

    /**
     * PAC with bounds given as doubles, each read as the decimal it prints as
     * ({@link BigDecimal#valueOf(double)}), so {@code 0.1} means exactly one tenth.
     */
    public double pac(double lower, double upper) {
        return pac(BigDecimal.valueOf(lower), BigDecimal.valueOf(upper));
    }

    /**
     * A decimal bound compared exactly with fractions: {@code x = unscaled / 10^scale}, so the sign of
     * {@code num / den - x} is that of {@code num · 10^scale - unscaled · den}, in long arithmetic when the
     * products fit (always, for bounds with up to 9 decimals), else in BigDecimal.
     */
    private static final class Bound {
        private final BigDecimal x;
        private final long unscaled;
        private final long power;
        private final boolean exactInLong;

        Bound(BigDecimal x) {
            this.x = x;
            BigDecimal stripped = x.scale() < 0 ? x.setScale(0) : x;
            boolean fits = stripped.scale() <= 9 && stripped.unscaledValue().bitLength() < 32;
            this.exactInLong = fits;
            this.unscaled = fits ? stripped.unscaledValue().longValue() : 0;
            this.power = fits ? LongPow.TEN[stripped.scale()] : 0;
        }

        /** The sign of {@code num / den - x}, exactly ({@code den > 0}). */
        int compare(int num, int den) {
            if (exactInLong) {
                // |num|, den < 2^31, power <= 10^9 < 2^30, |unscaled| < 2^31: both products stay below 2^62
                return Long.compare(num * power, unscaled * den);
            }
            return BigDecimal.valueOf(num).compareTo(x.multiply(BigDecimal.valueOf(den)));
        }
    }

    private static final class LongPow {
        static final long[] TEN = {1L, 10L, 100L, 1_000L, 10_000L, 100_000L, 1_000_000L, 10_000_000L, 100_000_000L,
            1_000_000_000L};
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ConsensusDistribution d && d.k == k && Arrays.equals(d.numerators, numerators)
                && Arrays.equals(d.denominators, denominators) && Arrays.equals(d.counts, counts);
    }

    @Override
    public int hashCode() {
        return Objects.hash(k, Arrays.hashCode(numerators), Arrays.hashCode(denominators), Arrays.hashCode(counts));
    }

    @Override
    public String toString() {
        return "ConsensusDistribution[k=" + k + ", " + counts.length + " distinct values, " + pairs() + " pairs]";
    }
}
