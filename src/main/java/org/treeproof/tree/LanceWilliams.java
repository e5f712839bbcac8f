package org.treeproof.tree;

/**
 * The coefficients of the Lance-Williams recurrence for one merge: when clusters {@code i} and
 * {@code j} merge, the dissimilarity of the union to a third cluster {@code k} is
 * {@code alphaI·d(k,i) + alphaJ·d(k,j) + beta·d(i,j) + gamma·|d(k,i) − d(k,j)|}.
 *
 * <p>G. N. Lance and W. T. Williams, "A general theory of classificatory sorting strategies: 1.
 * Hierarchical systems", The Computer Journal 9 (1967) 373-380, doi:10.1093/comjnl/9.4.373. For Ward,
 * centroid and median the recurrence holds for squared Euclidean distances.
 */
public record LanceWilliams(double alphaI, double alphaJ, double beta, double gamma) {

    public LanceWilliams {
        if (!Double.isFinite(alphaI) || !Double.isFinite(alphaJ) || !Double.isFinite(beta) || !Double.isFinite(gamma)) {
            throw new IllegalArgumentException("Lance-Williams coefficients must be finite");
        }
    }

    /** The updated dissimilarity of the union of {@code i} and {@code j} to {@code k}, in the general form. */
    public double apply(double dki, double dkj, double dij) {
        return alphaI * dki + alphaJ * dkj + beta * dij + gamma * Math.abs(dki - dkj);
    }
}
