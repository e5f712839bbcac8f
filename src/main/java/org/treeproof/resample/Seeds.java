package org.treeproof.resample;

/**
 * Derivation of every random seed a study uses from its one master seed.
 *
 * <p>A seed is a pure function of (master seed, purpose, index), so each replicate draws from its own
 * generator whatever thread runs it and in whatever order replicates finish; no generator is shared.
 * The mixing is the finaliser of SplitMix64 (G. L. Steele, D. Lea, C. H. Flood, "Fast splittable
 * pseudorandom number generators", OOPSLA 2014, doi:10.1145/2660193.2660195), applied to the master seed,
 * the purpose's constant and the index in turn, so that nearby inputs give unrelated seeds.
 */
public final class Seeds {
    private Seeds() {
    }

    /** What a seed is used for; each purpose draws from its own stream. */
    public enum Purpose {
        /** Which samples (and features) a stability replicate holds. */
        REPLICATE(0x5EED_0001L),
        /** A reference data set for the gap statistic. */
        GAP_REFERENCE(0x5EED_0002L),
        /** A null data set for calibrating stability. */
        NULL_DATA(0x5EED_0003L),
        /** The replicates drawn from one null data set. */
        NULL_REPLICATE(0x5EED_0004L),
        /** Random keys for hashing clades when counting branch support. */
        CLADE_KEYS(0x5EED_0005L),
        /** The permutations of a covariate for a Monte Carlo test of its association with the clusters. */
        COVARIATE_PERMUTATION(0x5EED_0101L);

        private final long salt;

        Purpose(long salt) {
            this.salt = salt;
        }
    }

    /** The seed for replicate {@code index} of the given purpose under {@code masterSeed}. */
    public static long seedFor(long masterSeed, Purpose purpose, long index) {
        long h = mix(masterSeed ^ 0x9E3779B97F4A7C15L);
        h = mix(h ^ purpose.salt);
        return mix(h + index * 0x9E3779B97F4A7C15L);
    }

    /** A seed derived from a parent seed and an index, for streams nested inside one replicate. */
    public static long child(long parentSeed, long index) {
        return mix(mix(parentSeed) + (index + 1) * 0xBF58476D1CE4E5B9L);
    }

    /** SplitMix64's 64-bit finaliser (variant 13 of D. Stafford's mixers). */
    static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }
}
