package org.treeproof.resample;

import java.util.Arrays;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.stream.Collectors;
import org.treeproof.data.InputException;

/**
 * How a replicate draws its samples.
 *
 * <p>Subsampling without replacement is the default: a bootstrap with replacement holds only about
 * 1 - 1/e = 63% distinct samples, and its duplicates sit at distance 0 and merge first, which
 * inflates apparent stability. Both are in Monti et al. (2003), Machine Learning 52:91-118,
 * doi:10.1023/A:1023949509487, and Hennig (2007), Comput. Stat. Data Anal. 52:258-271,
 * doi:10.1016/j.csda.2006.11.025.
 */
public enum Resampling {
    /** A fraction of the samples, drawn without replacement. */
    SUBSAMPLE("subsample") {
        @Override
        int[] draw(int n, double fraction, SplittableRandom rng) {
            int m = Math.max(2, (int) Math.round(fraction * n));
            m = Math.min(m, n);
            return sortedSubset(n, m, rng);
        }
    },
    /**
     * n draws with replacement. The replicate's tree is built on every draw, copies included, so copies
     * weigh as the bootstrap intends; scores are computed over the distinct samples, each copy of a
     * sample carrying the label of its copies (copies are at distance 0 and join before any cut k that a
     * study uses, which needs k no larger than the number of distinct samples).
     */
    BOOTSTRAP("bootstrap") {
        @Override
        int[] draw(int n, double fraction, SplittableRandom rng) {
            int[] d = new int[n];
            for (int i = 0; i < n; i++) {
                d[i] = rng.nextInt(n);
            }
            Arrays.sort(d);
            return d;
        }
    };

    private final String id;

    Resampling(String id) {
        this.id = id;
    }

    /** The user-facing name. */
    public String id() {
        return id;
    }

    /** The drawn sample indices, sorted; may repeat for {@link #BOOTSTRAP}. */
    abstract int[] draw(int n, double fraction, SplittableRandom rng);

    /** Parses a user-typed name, case-insensitively. */
    public static Resampling parse(String s) {
        for (Resampling r : values()) {
            if (r.id.equalsIgnoreCase(s.trim())) {
                return r;
            }
        }
        throw new InputException("unknown resampling scheme '" + s + "'; use one of "
                + Arrays.stream(values()).map(Resampling::id).collect(Collectors.joining(", ")));
    }

    /**
     * {@code m} distinct indices from {@code 0..n-1}, sorted: a partial Fisher-Yates shuffle, so each
     * m-subset is equally likely.
     */
    static int[] sortedSubset(int n, int m, SplittableRandom rng) {
        int[] perm = new int[n];
        for (int i = 0; i < n; i++) {
            perm[i] = i;
        }
        for (int i = 0; i < m; i++) {
            int j = i + rng.nextInt(n - i);
            int t = perm[i];
            perm[i] = perm[j];
            perm[j] = t;
        }
        int[] out = Arrays.copyOf(perm, m);
        Arrays.sort(out);
        return out;
    }

    @Override
    public String toString() {
        return id.toLowerCase(Locale.ROOT);
    }
}
