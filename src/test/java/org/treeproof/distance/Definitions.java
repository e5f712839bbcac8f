package org.treeproof.distance;

/**
 * The metrics written out exactly as their textbook formulas, pair by pair, with no blocking, scaling
 * or shortcuts: an independent check of the kernels. Sources are those cited in {@link Metric}.
 */
final class Definitions {
    private Definitions() {
    }

    static double of(Metric m, double[] x, double[] y) {
        return switch (m) {
            case EUCLIDEAN -> Math.sqrt(sqeuclidean(x, y));
            case SQEUCLIDEAN -> sqeuclidean(x, y);
            case MANHATTAN -> {
                double s = 0;
                for (int k = 0; k < x.length; k++) {
                    s += Math.abs(x[k] - y[k]);
                }
                yield s;
            }
            case CHEBYSHEV -> {
                double s = 0;
                for (int k = 0; k < x.length; k++) {
                    s = Math.max(s, Math.abs(x[k] - y[k]));
                }
                yield s;
            }
            case COSINE -> 1 - dot(x, y) / Math.sqrt(dot(x, x) * dot(y, y));
            case PEARSON -> pearsonDistance(x, y);
            case SPEARMAN -> pearsonDistance(ranks(x), ranks(y));
            case JACCARD -> {
                int differ = 0;
                int either = 0;
                for (int k = 0; k < x.length; k++) {
                    differ += x[k] != y[k] ? 1 : 0;
                    either += x[k] != 0 || y[k] != 0 ? 1 : 0;
                }
                yield either == 0 ? 0 : (double) differ / either;
            }
            case HAMMING -> {
                int differ = 0;
                for (int k = 0; k < x.length; k++) {
                    differ += x[k] != y[k] ? 1 : 0;
                }
                yield (double) differ / x.length;
            }
        };
    }

    private static double sqeuclidean(double[] x, double[] y) {
        double s = 0;
        for (int k = 0; k < x.length; k++) {
            s += (x[k] - y[k]) * (x[k] - y[k]);
        }
        return s;
    }

    private static double dot(double[] x, double[] y) {
        double s = 0;
        for (int k = 0; k < x.length; k++) {
            s += x[k] * y[k];
        }
        return s;
    }

    private static double pearsonDistance(double[] x, double[] y) {
        double mx = 0;
        double my = 0;
        for (int k = 0; k < x.length; k++) {
            mx += x[k] / x.length;
            my += y[k] / y.length;
        }
        double sxy = 0;
        double sxx = 0;
        double syy = 0;
        for (int k = 0; k < x.length; k++) {
            sxy += (x[k] - mx) * (y[k] - my);
            sxx += (x[k] - mx) * (x[k] - mx);
            syy += (y[k] - my) * (y[k] - my);
        }
        return 1 - sxy / Math.sqrt(sxx * syy);
    }

    /** Rank = 1 + (number of smaller values) + (number of other equal values) / 2: the average rank. */
    private static double[] ranks(double[] x) {
        double[] r = new double[x.length];
        for (int k = 0; k < x.length; k++) {
            int less = 0;
            int equal = 0;
            for (double v : x) {
                less += v < x[k] ? 1 : 0;
                equal += v == x[k] ? 1 : 0;
            }
            r[k] = 1 + less + (equal - 1) / 2.0;
        }
        return r;
    }
}
