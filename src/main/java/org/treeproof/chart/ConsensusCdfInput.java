package org.treeproof.chart;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * What the consensus-CDF chart shows: for one linkage, the empirical CDF of the consensus values at each k and the
 * relative change in the area under it from k − 1 to k.
 *
 * @param title     the chart title in plain words
 * @param ks        the k of each curve, increasing, consecutive
 * @param curves    per k, the CDF as {@code [x, F(x)]} points, x increasing in [0, 1], F non-decreasing, ending at 1
 * @param deltaArea per k, the relative change in area (NaN where not defined)
 * @param chosenK   the k to mark, or 0 for none
 */
public record ConsensusCdfInput(String title, int[] ks, List<double[][]> curves, double[] deltaArea, int chosenK) {

    public ConsensusCdfInput {
        Check.text(title, "title");
        ks = ks.clone();
        Objects.requireNonNull(curves, "curves");
        if (ks.length == 0 || curves.size() != ks.length || deltaArea.length != ks.length) {
            throw new IllegalArgumentException("one curve and one change in area per k expected");
        }
        var copy = new ArrayList<double[][]>();
        for (int i = 0; i < ks.length; i++) {
            if (i > 0 && ks[i] != ks[i - 1] + 1) {
                throw new IllegalArgumentException("ks must be consecutive");
            }
            double[][] c = curves.get(i);
            if (c.length == 0) {
                throw new IllegalArgumentException("the curve at k = " + ks[i] + " is empty");
            }
            double[][] cc = new double[c.length][];
            for (int j = 0; j < c.length; j++) {
                if (c[j].length != 2 || !(c[j][0] >= 0 && c[j][0] <= 1) || !(c[j][1] >= 0 && c[j][1] <= 1)
                        || (j > 0 && (c[j][0] <= c[j - 1][0] || c[j][1] < c[j - 1][1]))) {
                    throw new IllegalArgumentException("the curve at k = " + ks[i] + " is not a CDF on [0, 1]");
                }
                cc[j] = c[j].clone();
            }
            copy.add(cc);
        }
        curves = List.copyOf(copy);
        deltaArea = deltaArea.clone();
        if (chosenK != 0 && (chosenK < ks[0] || chosenK > ks[ks.length - 1])) {
            throw new IllegalArgumentException("chosen k " + chosenK + " is not among the curves");
        }
    }

    @Override
    public int[] ks() {
        return ks.clone();
    }

    @Override
    public double[] deltaArea() {
        return deltaArea.clone();
    }

    double[][] curveAt(int i) {
        return curves.get(i);
    }
}
