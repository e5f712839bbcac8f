package org.treeproof.tree;

import java.util.Locale;
import java.util.Objects;
import org.treeproof.data.InputException;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.distance.OwnedDistances;

/**
 * The linkage methods of agglomerative hierarchical clustering, each carrying its Lance-Williams
 * coefficients, its flags and the algorithm that clusters with it.
 *
 * <p>Algorithms follow D. Müllner, "Modern hierarchical, agglomerative clustering algorithms",
 * arXiv:1109.2378 (2011): single linkage by a minimum spanning tree (Prim), complete, average, weighted
 * and Ward by the nearest-neighbour chain, centroid and median by the generic algorithm with a
 * nearest-neighbour list. The Ward variant is the one Murtagh and Legendre call Ward2 (F. Murtagh and
 * P. Legendre, "Ward's hierarchical agglomerative clustering method: which algorithms implement Ward's
 * criterion?", J. Classification 31 (2014) 274-295, doi:10.1007/s00357-014-9161-z).
 *
 * <p>Ward, centroid and median take plain (not squared) Euclidean distances and run the recurrence on
 * their squares, reporting the square root, so a Ward height is {@code sqrt(2·ΔESS)}, the convention of
 * scipy.cluster.hierarchy.linkage. The working matrix keeps the roots and each update squares its
 * three inputs and takes the root of the result, with the same floating-point operations in the same
 * order as scipy 1.10: merge heights then agree with scipy's bit for bit, and so do the choices
 * between mathematically tied distances, which a matrix of squares would resolve by rounding noise.
 * Ties are resolved as scipy resolves them: in every scan the smaller index wins (and in the generic
 * algorithm, between equal heap entries, scipy's heap layout; see {@code GenericLinkage}).
 */
public enum Linkage {
    /** Nearest neighbour; d(k, i∪j) = min(d(k,i), d(k,j)). */
    SINGLE(Algorithm.MINIMUM_SPANNING_TREE, false, true) {
        @Override
        public LanceWilliams coefficients(int ni, int nj, int nk) {
            return new LanceWilliams(0.5, 0.5, 0.0, -0.5);
        }

        @Override
        void update(double[] dx, double[] dy, double dxy, int nx, int ny, int[] nk, int count) {
            for (int r = 0; r < count; r++) {
                double a = dx[r];
                double b = dy[r];
                dy[r] = a < b ? a : b;
            }
        }
    },
    /** Furthest neighbour; d(k, i∪j) = max(d(k,i), d(k,j)). */
    COMPLETE(Algorithm.NEAREST_NEIGHBOR_CHAIN, false, true) {
        @Override
        public LanceWilliams coefficients(int ni, int nj, int nk) {
            return new LanceWilliams(0.5, 0.5, 0.0, 0.5);
        }

        @Override
        void update(double[] dx, double[] dy, double dxy, int nx, int ny, int[] nk, int count) {
            // Math.max compiles without a branch (which of two distances is larger is unpredictable); it can
            // differ from a > b ? a : b only for NaN, which distances never are, and when the larger is a zero
            // (signed zeros), which takes the comparison, rarely
            for (int r = 0; r < count; r++) {
                double a = dx[r];
                double b = dy[r];
                double m = Math.max(a, b);
                dy[r] = m == 0.0 ? (a > b ? a : b) : m;
            }
        }
    },
    /** UPGMA: the mean of all pairwise distances between the two clusters. */
    AVERAGE(Algorithm.NEAREST_NEIGHBOR_CHAIN, false, true, "upgma") {
        @Override
        public LanceWilliams coefficients(int ni, int nj, int nk) {
            double s = ni + nj;
            return new LanceWilliams(ni / s, nj / s, 0.0, 0.0);
        }

        @Override
        void update(double[] dx, double[] dy, double dxy, int nx, int ny, int[] nk, int count) {
            double wx = nx;
            double wy = ny;
            double s = nx + ny;
            for (int r = 0; r < count; r++) {
                dy[r] = (wx * dx[r] + wy * dy[r]) / s;
            }
        }
    },
    /** WPGMA (McQuitty): the plain mean of the two merged clusters' distances. */
    WEIGHTED(Algorithm.NEAREST_NEIGHBOR_CHAIN, false, true, "wpgma") {
        @Override
        public LanceWilliams coefficients(int ni, int nj, int nk) {
            return new LanceWilliams(0.5, 0.5, 0.0, 0.0);
        }

        @Override
        void update(double[] dx, double[] dy, double dxy, int nx, int ny, int[] nk, int count) {
            for (int r = 0; r < count; r++) {
                dy[r] = 0.5 * (dx[r] + dy[r]);
            }
        }
    },
    /** Ward's minimum-variance method on squared Euclidean distances (Ward2 of Murtagh and Legendre). */
    WARD(Algorithm.NEAREST_NEIGHBOR_CHAIN, true, true) {
        @Override
        public LanceWilliams coefficients(int ni, int nj, int nk) {
            double s = ni + nj + nk;
            return new LanceWilliams((ni + nk) / s, (nj + nk) / s, -nk / s, 0.0);
        }

        @Override
        void update(double[] dx, double[] dy, double dxy, int nx, int ny, int[] nk, int count) {
            for (int r = 0; r < count; r++) {
                int k = nk[r];
                double t = 1.0 / (nx + ny + k);
                double a = dx[r];
                double b = dy[r];
                dy[r] = root((k + nx) * t * a * a + (k + ny) * t * b * b - k * t * dxy * dxy);
            }
        }
    },
    /** UPGMC: the distance between cluster centroids; heights may decrease (inversions). */
    CENTROID(Algorithm.GENERIC, true, false) {
        @Override
        public LanceWilliams coefficients(int ni, int nj, int nk) {
            double s = ni + nj;
            return new LanceWilliams(ni / s, nj / s, -(double) ni * nj / (s * s), 0.0);
        }

        @Override
        void update(double[] dx, double[] dy, double dxy, int nx, int ny, int[] nk, int count) {
            int s = nx + ny;
            double c = nx * ny * dxy * dxy / s;
            for (int r = 0; r < count; r++) {
                double a = dx[r];
                double b = dy[r];
                dy[r] = root((nx * a * a + ny * b * b - c) / s);
            }
        }
    },
    /** WPGMC (Gower): the distance between cluster medians; heights may decrease (inversions). */
    MEDIAN(Algorithm.GENERIC, true, false) {
        @Override
        public LanceWilliams coefficients(int ni, int nj, int nk) {
            return new LanceWilliams(0.5, 0.5, -0.25, 0.0);
        }

        @Override
        void update(double[] dx, double[] dy, double dxy, int nx, int ny, int[] nk, int count) {
            double c = 0.25 * dxy * dxy;
            for (int r = 0; r < count; r++) {
                double a = dx[r];
                double b = dy[r];
                dy[r] = root(0.5 * (a * a + b * b) - c);
            }
        }
    };

    private final Algorithm algorithm;
    private final boolean euclidean;
    private final boolean monotone;
    private final String alias;

    Linkage(Algorithm algorithm, boolean euclidean, boolean monotone) {
        this(algorithm, euclidean, monotone, null);
    }

    Linkage(Algorithm algorithm, boolean euclidean, boolean monotone, String alias) {
        this.algorithm = algorithm;
        this.euclidean = euclidean;
        this.monotone = monotone;
        this.alias = alias;
    }

    /**
     * The linkage named {@code name} (case-insensitive; {@code upgma} and {@code wpgma} are aliases).
     *
     * @throws InputException naming the valid choices if the name is unknown
     */
    public static Linkage parse(String name) {
        Objects.requireNonNull(name, "name");
        String key = name.strip().toLowerCase(Locale.ROOT);
        for (Linkage l : values()) {
            if (l.id().equals(key) || key.equals(l.alias)) {
                return l;
            }
        }
        StringBuilder valid = new StringBuilder();
        for (Linkage l : values()) {
            if (valid.length() > 0) {
                valid.append(", ");
            }
            valid.append(l.id());
            if (l.alias != null) {
                valid.append(" (").append(l.alias).append(')');
            }
        }
        throw new InputException("unknown linkage '" + name + "'; valid names are " + valid);
    }

    /** The lower-case name used on the command line and in JSON. */
    public String id() {
        return name().toLowerCase(Locale.ROOT);
    }

    /**
     * Whether the method is defined only for Euclidean distances (Ward, centroid, median): the input must
     * be plain Euclidean distances, which the method squares internally.
     */
    public boolean requiresEuclidean() {
        return euclidean;
    }

    /** Whether merge heights never decrease (false for centroid and median, which can invert). */
    public boolean monotone() {
        return monotone;
    }

    /**
     * The Lance-Williams coefficients for merging clusters of sizes {@code ni} and {@code nj}, seen from a
     * cluster of size {@code nk}. For Euclidean-only methods they apply to squared distances.
     */
    public abstract LanceWilliams coefficients(int ni, int nj, int nk);

    /**
     * The recurrence specialised for speed: {@code dy[r] ← d(k_r, x∪y)} from {@code dx[r] = d(k_r, x)},
     * {@code dy[r] = d(k_r, y)}, for {@code r < count}. For Euclidean-only methods the arguments and the
     * result are plain distances and the recurrence is applied to their squares, with scipy's order of
     * floating-point operations. One call per merge keeps the loop monomorphic.
     */
    abstract void update(double[] dx, double[] dy, double dxy, int nx, int ny, int[] nk, int count);

    /**
     * The square root of a squared distance from the recurrence; rounding can push the squared distance
     * between coincident centroids just below zero, where it is taken as zero (scipy would give NaN).
     */
    private static double root(double squared) {
        return squared > 0 ? Math.sqrt(squared) : 0.0;
    }

    /**
     * Clusters the items of {@code distances} (plain Euclidean distances if {@link #requiresEuclidean()}).
     * Uses O(n) memory beyond one working copy of the condensed matrix (none for single linkage).
     */
    public MergeTree cluster(CondensedDistances distances) {
        Objects.requireNonNull(distances, "distances");
        return algorithm.run(this, distances);
    }

    /**
     * Clusters the items of {@code distances} in place: the linkage takes the matrix over and overwrites it, so
     * no working copy is made and {@code distances} is empty afterwards. The same tree as
     * {@link #cluster(CondensedDistances)} on the same values, for a caller that needs the distances no longer.
     *
     * @throws IllegalStateException if the distances have already been given up
     */
    public MergeTree clusterInPlace(OwnedDistances distances) {
        Objects.requireNonNull(distances, "distances");
        return algorithm.runInPlace(this, distances);
    }

    /**
     * The tree of each linkage over {@code distances}, which the last linkage takes over in place; every other
     * linkage works on a copy in {@code work} (a lent array of the matrix's length, overwritten in turn; may be
     * null for one linkage). The caller may use {@code work} again once this returns. The same trees as
     * {@link #cluster(CondensedDistances)} one by one, without a fresh copy per linkage.
     */
    public static java.util.List<MergeTree> clusterEach(java.util.List<Linkage> linkages, OwnedDistances distances,
            double[] work) {
        var trees = new java.util.ArrayList<MergeTree>(linkages.size());
        int last = linkages.size() - 1;
        for (int l = 0; l <= last; l++) {
            trees.add(linkages.get(l).clusterInPlace(l == last ? distances : distances.copyInto(work)));
        }
        return trees;
    }

    /** The agglomeration algorithm a linkage uses, as described by Müllner (2011). */
    private enum Algorithm {
        MINIMUM_SPANNING_TREE {
            @Override
            MergeTree run(Linkage linkage, CondensedDistances d) {
                return new MinimumSpanningTree(d).run();
            }

            @Override
            MergeTree runInPlace(Linkage linkage, OwnedDistances d) {
                return run(linkage, d.freeze()); // reads the matrix without changing it
            }
        },
        NEAREST_NEIGHBOR_CHAIN {
            @Override
            MergeTree run(Linkage linkage, CondensedDistances d) {
                return new NearestNeighborChain(linkage, new WorkingDistances(d)).run();
            }

            @Override
            MergeTree runInPlace(Linkage linkage, OwnedDistances d) {
                int n = d.size();
                return new NearestNeighborChain(linkage, new WorkingDistances(n, d.take())).run();
            }
        },
        GENERIC {
            @Override
            MergeTree run(Linkage linkage, CondensedDistances d) {
                return new GenericLinkage(linkage, new WorkingDistances(d)).run();
            }

            @Override
            MergeTree runInPlace(Linkage linkage, OwnedDistances d) {
                int n = d.size();
                return new GenericLinkage(linkage, new WorkingDistances(n, d.take())).run();
            }
        };

        abstract MergeTree run(Linkage linkage, CondensedDistances d);

        abstract MergeTree runInPlace(Linkage linkage, OwnedDistances d);
    }
}
