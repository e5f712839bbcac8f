// Tried in the tenth session (4 December 2026), not part of the build: copied into src/main/java/org/treeproof/score/ of a
// scratch copy, with StudyRunner calling TrialSeparation.log(geometry, c, linkage, k) for every cut; see
// bench/judgement/README.md, "Rechecked end to end".
package org.treeproof.score;

import java.util.Arrays;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.DipTest;
import org.treeproof.partition.Clustering;

/** Trial only: variants of the separation test, written to the file named by -Dtreeproof.trialOut. */
public final class TrialSeparation {
    private TrialSeparation() {
    }

    public static synchronized void log(DataMatrix data, Clustering c, String linkage, int k) {
        String out = System.getenv("TREEPROOF_TRIAL_OUT");
        if (out == null) {
            return;
        }
        StringBuilder sb = new StringBuilder();
        String cmd = System.getProperty("sun.java.command", "?").replace('\t', ' ');
        sb.append(cmd).append('\t').append(linkage).append('\t').append(k);
        sb.append('\t').append(Separation.of(data, c).pValue());
        for (int f : new int[] {10, 20}) {
            sb.append('\t').append(variant(data, c, f, false));
        }
        sb.append('\t').append(variant(data, c, 20, true));
        sb.append('\t').append(variant(data, c, 20, false, 0.5, 0.5));
        sb.append('\t').append(variant(data, c, 20, false, 0.5, 0.25));
        sb.append('\t').append(variant(data, c, 20, false, 0.35, 0.35));
        sb.append('\n');
        try {
            java.nio.file.Files.writeString(java.nio.file.Path.of(out), sb.toString(),
                    java.nio.file.StandardOpenOption.CREATE, java.nio.file.StandardOpenOption.APPEND);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    static double variant(DataMatrix data, Clustering clustering, int floor, boolean localLine) {
        return variant(data, clustering, floor, localLine, 0.25, 0.25);
    }

    static double variant(DataMatrix data, Clustering clustering, int floor, boolean localLine, double shS,
            double shL) {
        int k = clustering.k();
        int p = data.features();
        int[] sizes = clustering.clusterSizes();
        int[][] members = new int[k][];
        for (int c = 0; c < k; c++) {
            members[c] = new int[sizes[c]];
        }
        int[] fill = new int[k];
        double[][] centroid = new double[k][p];
        double[] row = new double[p];
        for (int i = 0; i < clustering.size(); i++) {
            int c = clustering.label(i);
            if (c < 0) {
                continue;
            }
            members[c][fill[c]++] = i;
            data.copyRow(i, row, 0);
            for (int f = 0; f < p; f++) {
                centroid[c][f] += row[f];
            }
        }
        for (int c = 0; c < k; c++) {
            for (int f = 0; f < p; f++) {
                centroid[c][f] /= sizes[c];
            }
        }
        double worst = Double.NaN;
        for (int a = 0; a < k; a++) {
            int b = nearest(centroid, a);
            if (b < 0) {
                continue;
            }
            boolean aSmaller = sizes[a] < sizes[b] || (sizes[a] == sizes[b] && a < b);
            int s = aSmaller ? a : b;
            int l = aSmaller ? b : a;
            if (2 * sizes[s] < DipTest.MIN_SAMPLES) {
                continue;
            }
            int ms = Math.max((int) Math.ceil(shS * sizes[s]), Math.min(sizes[s], floor));
            int hl = Math.max((int) Math.ceil(shL * sizes[l]), Math.min(sizes[l], floor));
            hl = Math.max(hl, ms);
            int[] nearS = nearestMembers(data, members[s], centroid[l], ms);
            int[] nearL = nearestMembers(data, members[l], centroid[s], hl);
            double[] cs = centroid[s];
            double[] cl = centroid[l];
            int ns = sizes[s];
            int nl = sizes[l];
            if (localLine) {
                cs = mean(data, nearS, p);
                cl = mean(data, nearL, p);
                ns = nearS.length;
                nl = nearL.length;
            }
            int copies = (int) Math.round((double) hl / ms);
            double[] positions = new double[ms * copies + hl];
            int t = 0;
            for (int i : nearS) {
                double v = position(data, i, row, cs, ns, cl);
                for (int c = 0; c < copies; c++) {
                    positions[t++] = v;
                }
            }
            for (int i : nearL) {
                positions[t++] = -position(data, i, row, cl, nl, cs);
            }
            double pv = DipTest.pValue(DipTest.dip(positions), Separation.effectiveSize(ms, hl)).pValue();
            worst = Double.isNaN(worst) ? pv : Math.max(worst, pv);
        }
        return worst;
    }

    private static double[] mean(DataMatrix data, int[] idx, int p) {
        double[] m = new double[p];
        double[] row = new double[p];
        for (int i : idx) {
            data.copyRow(i, row, 0);
            for (int f = 0; f < p; f++) {
                m[f] += row[f];
            }
        }
        for (int f = 0; f < p; f++) {
            m[f] /= idx.length;
        }
        return m;
    }

    private static int nearest(double[][] centroid, int a) {
        int best = -1;
        double bestD = Double.POSITIVE_INFINITY;
        for (int b = 0; b < centroid.length; b++) {
            if (b == a) {
                continue;
            }
            double d = squared(centroid[a], centroid[b]);
            if (d < bestD) {
                bestD = d;
                best = b;
            }
        }
        return best;
    }

    private static int[] nearestMembers(DataMatrix data, int[] members, double[] centre, int m) {
        double[] row = new double[data.features()];
        Integer[] order = new Integer[members.length];
        double[] d = new double[members.length];
        for (int t = 0; t < members.length; t++) {
            order[t] = t;
            data.copyRow(members[t], row, 0);
            d[t] = squared(row, centre);
        }
        Arrays.sort(order, (x, y) -> d[x] != d[y] ? Double.compare(d[x], d[y]) : Integer.compare(x, y));
        int[] out = new int[m];
        for (int t = 0; t < m; t++) {
            out[t] = members[order[t]];
        }
        return out;
    }

    private static double position(DataMatrix data, int i, double[] row, double[] own, int ownSize, double[] other) {
        data.copyRow(i, row, 0);
        double norm = 0;
        double s = 0;
        for (int f = 0; f < row.length; f++) {
            double o = ownSize > 1 ? (ownSize * own[f] - row[f]) / (ownSize - 1) : own[f];
            double dir = o - other[f];
            norm += dir * dir;
            s += (row[f] - (o + other[f]) / 2) * dir;
        }
        return norm == 0 ? 0 : s / Math.sqrt(norm);
    }

    private static double squared(double[] x, double[] y) {
        double s = 0;
        for (int f = 0; f < x.length; f++) {
            double d = x[f] - y[f];
            s += d * d;
        }
        return s;
    }
}
