package org.treeproof.chart;

import java.util.ArrayList;
import org.treeproof.score.ConsensusCdf;
import org.treeproof.study.BranchPValues;
import org.treeproof.study.LinkageEvidence;

/** What the charts take from a linkage's branch p-values. */
final class BranchPValueCharts {
    private BranchPValueCharts() {
    }

    /** The consensus-CDF chart's input for one linkage: every k's CDF (at most the output's points) and change. */
    static ConsensusCdfInput cdfInput(String title, LinkageEvidence le, int chosenK) {
        var curves = new ArrayList<double[][]>();
        int[] ks = new int[le.consensusCdf().size()];
        double[] delta = new double[ks.length];
        for (int i = 0; i < ks.length; i++) {
            ConsensusCdf c = le.consensusCdf().get(i);
            ks[i] = c.k();
            delta[i] = c.deltaArea();
            curves.add(c.points(le.consensus().distribution(c.k()), ConsensusCdf.OUTPUT_POINTS));
        }
        return new ConsensusCdfInput(title, ks, curves, delta, chosenK);
    }

    /** Per merge, the AU p-value (NaN where none); {@code null} when branch p-values were not computed. */
    static double[] auPerMerge(LinkageEvidence le) {
        BranchPValues pv = le.branchPValues();
        if (pv == null) {
            return null;
        }
        double[] au = new double[pv.fits().size()];
        for (int s = 0; s < au.length; s++) {
            au[s] = pv.at(s).au();
        }
        return au;
    }
}
