package org.treeproof.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.treeproof.study.ClusterBranch;

/**
 * The clustering tree, cut into clusters: branches inside a cluster in its colour, branches that join
 * clusters in grey, the cut as a dashed line, a strip of cluster colours under the leaves, and the support
 * of the highest forks as small numbers. With AU p-values from the multiscale bootstrap, each of the highest forks
 * that has one carries a square, filled when au reaches {@link ClusterBranch#LOW_AU} and hollow below it, and the
 * fork of each cluster at the cut is labelled with its au.
 *
 * <p>Up to {@value #MAX_LABELLED} leaves the chart widens to give every leaf name room
 * ({@code max(1200, 350 + 9n)} pixels); beyond that it is {@value #BASE_WIDTH} pixels wide and leaf names are
 * left out, the colour strip still showing where each cluster lies. Height is always {@value #HEIGHT}.
 * Writes PNG and SVG.
 */
public final class DendrogramChart {
    /** Most leaves whose names are printed. */
    public static final int MAX_LABELLED = 200;
    /** Width when leaf names are not printed. */
    public static final int BASE_WIDTH = 1200;
    public static final int HEIGHT = 780;
    /** How many of the highest forks carry their support value. */
    public static final int SUPPORT_SHOWN = 30;

    private static final double KEY_WIDTH = 250;
    private static final double LABEL_BAND = 120;
    private static final double STRIP = 13;

    private final DendrogramInput in;

    public DendrogramChart(DendrogramInput input) {
        this.in = java.util.Objects.requireNonNull(input, "input");
    }

    /** Pixel width for this input. */
    public int width() {
        int n = in.tree().leafCount();
        return n <= MAX_LABELLED ? Math.max(BASE_WIDTH, 350 + 9 * n) : BASE_WIDTH;
    }

    /** Pixel height, always {@value #HEIGHT}. */
    public int height() {
        return HEIGHT;
    }

    /** Writes {@code baseName.png} and {@code baseName.svg} into {@code dir}; returns the file names. */
    public List<String> write(Path dir, String baseName) throws IOException {
        return ChartFiles.write(dir, baseName, width(), height(), true, this::paint);
    }

    void paint(Graphics2D g) {
        ChartTree tree = in.tree();
        int n = tree.leafCount();
        int k = in.clusterCount();
        boolean names = n <= MAX_LABELLED;
        double w = width();
        double top = Look.title(g, in.title(), w, 14) + 8;
        int inversions = tree.inversions();
        if (inversions > 0) {
            g.setFont(Look.font(Look.NOTE_SIZE));
            g.setColor(Look.MUTED);
            String note = inversions + (inversions == 1 ? " merge lies" : " merges lie")
                    + " below a part it joins (an inversion); such forks are drawn at their true height, so their"
                    + " stems point down.";
            Look.textCentredBelow(g, note, w / 2, top);
            top += g.getFontMetrics().getHeight() + 4;
        }
        double plotLeft = 96;
        double plotRight = w - KEY_WIDTH - 24;
        float nameSize = (float) Math.min(11, Math.max(7, (plotRight - plotLeft) / n * 0.95));
        int maxChars = (int) (LABEL_BAND / (nameSize * 0.62));
        double band = 0;
        if (names) {
            g.setFont(Look.font(nameSize));
            for (int leaf = 0; leaf < n; leaf++) {
                band = Math.max(band, Look.width(g, Look.clipMiddle(in.labelAt(leaf), maxChars)) + 6);
            }
            band = Math.min(band, LABEL_BAND);
        }
        double bottomRoom = 20 + 44 + band;
        Rectangle2D plot = new Rectangle2D.Double(plotLeft, top + 14, plotRight - plotLeft,
                HEIGHT - bottomRoom - (top + 14));

        TreeDrawing drawing = new TreeDrawing(tree, in.clusterView());
        double[] range = drawing.heightRange();
        double hMin = range[0];
        double hMax = range[1];
        if (Double.isFinite(in.cutHeight())) {
            hMin = Math.min(hMin, in.cutHeight());
            hMax = Math.max(hMax, in.cutHeight());
        }
        hMax = hMax + 0.04 * (hMax - hMin);
        double[] ticks = Ticks.between(hMin, hMax, 7);
        Axes axes = new Axes(plot, 0, n, hMin, hMax);
        axes.gridY(g, ticks);
        axes.left(g, ticks, Axes.labels(ticks), in.heightLabel());

        TreeDrawing.Placed placed = drawing.place(plot, hMin, hMax, TreeDrawing.Leaves.BOTTOM);
        float stroke = placed.leafSpacing() >= 4 ? 1.4f : 1.1f;
        placed.draw(g, Clusters.colours(k), ChartColors.ABOVE_CUT, stroke);

        if (Double.isFinite(in.cutHeight())) {
            g.setColor(Look.RULE);
            g.setStroke(Look.DASHED);
            double cy = axes.y(in.cutHeight());
            g.draw(new Line2D.Double(plot.getX(), cy, plot.getMaxX(), cy));
        }
        List<Rectangle2D> taken = new ArrayList<>();
        int supportShown = drawSupport(g, tree, placed, plot, taken);
        int auShown = in.hasAu() ? drawAu(g, tree, placed, taken) : 0;

        double stripTop = plot.getMaxY() + 3;
        int[] order = tree.leafOrder();
        g.setFont(Look.font(Look.SMALL_SIZE));
        for (int[] run : Clusters.runs(in.clusterView(), order)) {
            Color colour = ChartColors.cluster(run[2]);
            g.setColor(colour);
            double x0 = placed.along(run[0]);
            double x1 = placed.along(run[1]);
            g.fill(new Rectangle2D.Double(x0, stripTop, x1 - x0, STRIP));
            // the number tells clusters apart where colours repeat (more than nine clusters)
            String number = Clusters.stripText(run[2]);
            if (x1 - x0 >= Look.width(g, number) + 6) {
                g.setColor(ChartColors.textOn(colour));
                Look.textLeft(g, number, (x0 + x1) / 2 - Look.width(g, number) / 2, stripTop + STRIP / 2);
            }
        }
        double y = stripTop + STRIP + 4;
        if (names) {
            g.setFont(Look.font(nameSize));
            g.setColor(Look.INK);
            for (int p = 0; p < n; p++) {
                Look.textDown(g, Look.clipMiddle(in.labelAt(order[p]), maxChars), placed.along(p + 0.5), y);
            }
            y += band;
        }
        g.setFont(Look.font(Look.LABEL_SIZE));
        g.setColor(Look.INK);
        String axisTitle = names ? n + " samples, in tree order"
                : n + " samples, in tree order (names left out: too many to print)";
        Look.textCentredBelow(g, axisTitle, plot.getCenterX(), y + 6);

        List<Key.Entry> entries = new ArrayList<>(Clusters.entries(Clusters.sizes(in.clusterView(), k), "samples"));
        entries.addAll(Clusters.outlierEntry(in.clusterView(), "samples"));
        if (k > 1) {
            entries.add(Key.Entry.line(ChartColors.ABOVE_CUT, new BasicStroke(2f), "branches that join clusters"));
        }
        if (Double.isFinite(in.cutHeight())) {
            entries.add(Key.Entry.line(Look.RULE, Look.DASHED, "cut at height " + Ticks.compact(in.cutHeight())));
        }
        if (supportShown > 0) {
            entries.add(Key.Entry.sample("0.87", "share of replicates whose tree has the group below a fork"
                    + " exactly, no sample more or less (at the highest forks, where there is room); a cluster's"
                    + " Jaccard counts near matches too"));
        }
        if (auShown > 0) {
            entries.add(Key.Entry.sample("\u25A0", "AU p-value of the group below the fork at least "
                    + Ticks.compact(ClusterBranch.LOW_AU) + " (multiscale bootstrap of features)"));
            entries.add(Key.Entry.sample("\u25A1", "AU p-value below " + Ticks.compact(ClusterBranch.LOW_AU)));
            entries.add(Key.Entry.sample("au 0.97", "a cluster's own fork with its AU p-value"));
        }
        if (placed.leafSpacing() < TreeDrawing.DENSE_PX) {
            entries.add(Key.Entry.fill(ChartColors.tint(ChartColors.ABOVE_CUT, TreeDrawing.WEDGE_TINT),
                    "shaded wedge: a small group whose leaves are too close to draw apart, up to its merge height"));
        }
        Key.list(g, plotRight + 28, plot.getY(), KEY_WIDTH - 20, k > 1 ? "Clusters at the cut (k = " + k + ")"
                : "One cluster: the tree is not cut", entries);
    }

    /** Support numbers at the highest forks, skipping any that would cover one already placed. */
    private int drawSupport(Graphics2D g, ChartTree tree, TreeDrawing.Placed placed, Rectangle2D plot,
            List<Rectangle2D> taken) {
        int n = tree.leafCount();
        g.setFont(Look.font(Look.SMALL_SIZE));
        int shown = 0;
        int considered = 0;
        for (int s = n - 2; s >= 0 && considered < SUPPORT_SHOWN; s--) {
            double v = in.supportAt(s);
            if (Double.isNaN(v)) {
                continue;
            }
            considered++;
            Point2D p = placed.point(n + s);
            String text = Ticks.number(v, 2);
            double tw = Look.width(g, text);
            double th = g.getFontMetrics().getAscent();
            Rectangle2D box = new Rectangle2D.Double(p.getX() + 3, p.getY() - th - 4, tw + 3, th + 2);
            if (box.getMaxX() > plot.getMaxX() + 20 || overlaps(box, taken)) {
                continue;
            }
            taken.add(box);
            Look.plate(g, box);
            g.setColor(Look.INK);
            g.fill(new Ellipse2D.Double(p.getX() - 2.2, p.getY() - 2.2, 4.4, 4.4));
            Look.draw(g, text, (float) (box.getX() + 1.5), (float) (p.getY() - 4));
            shown++;
        }
        return shown;
    }

    /**
     * AU squares at the highest forks that have a value, and "au .97" beside the fork of each cluster of the cut
     * (where it does not cover a label already placed).
     */
    private int drawAu(Graphics2D g, ChartTree tree, TreeDrawing.Placed placed, List<Rectangle2D> taken) {
        int n = tree.leafCount();
        int shown = 0;
        int considered = 0;
        g.setStroke(new BasicStroke(1.3f));
        for (int s = n - 2; s >= 0 && considered < SUPPORT_SHOWN; s--) {
            double v = in.auAt(s);
            if (Double.isNaN(v)) {
                continue;
            }
            considered++;
            Point2D p = placed.point(n + s);
            var square = new Rectangle2D.Double(p.getX() - 4, p.getY() - 4, 8, 8);
            g.setColor(v >= ClusterBranch.LOW_AU ? Look.INK : Color.WHITE);
            g.fill(square);
            g.setColor(Look.INK);
            g.draw(square);
            shown++;
        }
        g.setFont(Look.font(Look.SMALL_SIZE));
        for (int s : clusterForks(tree)) {
            double v = in.auAt(s);
            if (Double.isNaN(v)) {
                continue;
            }
            Point2D p = placed.point(n + s);
            // cut, not rounded, to three places, so a value below the flag level never prints as the level itself
            String text = "au " + String.format(java.util.Locale.ROOT, "%.3f", Math.floor(v * 1000) / 1000);
            double tw = Look.width(g, text);
            double th = g.getFontMetrics().getAscent();
            Rectangle2D box = new Rectangle2D.Double(p.getX() - tw - 9, p.getY() + 5, tw + 3, th + 2);
            if (overlaps(box, taken)) {
                continue;
            }
            taken.add(box);
            Look.plate(g, box);
            g.setColor(Look.INK);
            Look.draw(g, text, (float) (box.getX() + 1.5), (float) (box.getMaxY() - 2));
            shown++;
        }
        return shown;
    }

    /** The merges whose clade is a whole cluster of the cut (clusters of one sample have none). */
    private List<Integer> clusterForks(ChartTree tree) {
        int n = tree.leafCount();
        int[] uniform = new int[2 * n - 1];
        for (int leaf = 0; leaf < n; leaf++) {
            uniform[leaf] = in.clusterAt(leaf);
        }
        int[] top = new int[in.clusterCount()];
        java.util.Arrays.fill(top, -1);
        int[] left = tree.left();
        int[] right = tree.right();
        for (int s = 0; s < n - 1; s++) {
            int a = uniform[left[s]];
            int b = uniform[right[s]];
            uniform[n + s] = a >= 0 && a == b ? a : -1;
            if (uniform[n + s] >= 0) {
                top[uniform[n + s]] = s;
            }
        }
        var out = new ArrayList<Integer>();
        for (int t : top) {
            if (t >= 0 && in.clusterCount() > 1) {
                out.add(t);
            }
        }
        return out;
    }

    private static boolean overlaps(Rectangle2D r, List<Rectangle2D> taken) {
        for (Rectangle2D t : taken) {
            if (t.intersects(r)) {
                return true;
            }
        }
        return false;
    }
}
