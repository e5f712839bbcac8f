package org.treeproof.study;

import java.util.List;
import org.treeproof.score.MultiscaleFit;

/**
 * The branch p-values of one linkage's tree from the multiscale bootstrap of features (see {@link MultiscaleRun}).
 *
 * @param scales             the realised scales (drawn features / features), in the order run
 * @param replicatesPerScale replicates per scale
 * @param counts             {@code counts[s][merge]}: replicates at scale s whose tree has the merge's clade
 * @param fits               per merge of the tree, the fit of its counts (au, bp, their errors, the fit's quality)
 */
public record BranchPValues(double[] scales, int replicatesPerScale, int[][] counts, List<MultiscaleFit.Result> fits) {

    public BranchPValues {
        scales = scales.clone();
        counts = counts.clone();
        for (int s = 0; s < counts.length; s++) {
            counts[s] = counts[s].clone();
        }
        fits = List.copyOf(fits);
        if (counts.length != scales.length) {
            throw new IllegalArgumentException("one row of counts per scale expected");
        }
    }

    @Override
    public double[] scales() {
        return scales.clone();
    }

    @Override
    public int[][] counts() {
        int[][] c = counts.clone();
        for (int s = 0; s < c.length; s++) {
            c[s] = c[s].clone();
        }
        return c;
    }

    /** The fit of merge {@code s}. */
    public MultiscaleFit.Result at(int s) {
        return fits.get(s);
    }
}
