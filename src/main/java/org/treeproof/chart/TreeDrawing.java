package org.treeproof.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Path2D;
import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;

/**
 * Lays out and draws a {@link ChartTree} in a rectangle, leaves along one side and height along the other.
 *
 * <p>Each merge is drawn as a bracket: two stems rising from its parts to its height and a bar between
 * them. A bracket whose leaves all share one cluster takes that cluster's colour; brackets that join
 * clusters are grey. Where leaves are packed closer than a few pixels, each largest subtree narrower than
 * {@link #COLLAPSE_PX} is drawn as one wedge from its leaves up to its own height, so thousands of leaves
 * read as a row of wedges and never as a solid smear. Merges that sit below their parts (inversions) are
 * drawn at their true height, so their stems point down.
 */
final class TreeDrawing {
    /** Leaves closer than this (pixels) switch on the wedge drawing. */
    static final double DENSE_PX = 2.5;
    /** Subtrees narrower than this (pixels) become one wedge when leaves are dense. */
    static final double COLLAPSE_PX = 7.0;
    /** How far wedges are lightened towards white, so the brackets above them stand out. */
    static final double WEDGE_TINT = 0.4;

    /** Which side of the area holds the leaves. */
    enum Leaves { BOTTOM, RIGHT }

    private final ChartTree tree;
    private final int n;
    private final double[] pos;
    private final int[] lo;
    private final int[] size;
    private final int[] parent;
    private final int[] cluster;

    /**
     * @param clusterOfLeaf cluster label per leaf (by leaf index), or {@code null} to draw the whole tree in one
     *                      colour
     */
    TreeDrawing(ChartTree tree, int[] clusterOfLeaf) {
        this.tree = tree;
        this.n = tree.leafCount();
        int nodes = 2 * n - 1;
        pos = new double[nodes];
        lo = new int[nodes];
        size = new int[nodes];
        parent = new int[nodes];
        cluster = new int[nodes];
        parent[tree.root()] = -1;
        for (int p = 0; p < n; p++) {
            int leaf = tree.leafAt(p);
            pos[leaf] = p + 0.5;
            lo[leaf] = p;
            size[leaf] = 1;
            cluster[leaf] = clusterOfLeaf == null ? 0 : clusterOfLeaf[leaf];
        }
        for (int s = 0; s < n - 1; s++) {
            int node = n + s;
            int a = tree.leftOf(s);
            int b = tree.rightOf(s);
            pos[node] = (pos[a] + pos[b]) / 2;
            lo[node] = Math.min(lo[a], lo[b]);
            size[node] = size[a] + size[b];
            parent[a] = node;
            parent[b] = node;
            cluster[node] = cluster[a] == cluster[b] ? cluster[a] : -1;
        }
    }

    /** The lowest and highest node heights, with the leaves at 0. */
    double[] heightRange() {
        double min = 0;
        double max = 0;
        for (int s = 0; s < n - 1; s++) {
            min = Math.min(min, tree.heightOf(s));
            max = Math.max(max, tree.heightOf(s));
        }
        return new double[] {min, max};
    }

    /** The cluster label every leaf under {@code node} shares, or -1 if they differ. */
    int clusterOf(int node) {
        return cluster[node];
    }

    /** Placement of the tree in one rectangle; maps nodes to pixels. */
    final class Placed {
        private final Rectangle2D area;
        private final double hMin;
        private final double hMax;
        private final Leaves side;

        Placed(Rectangle2D area, double hMin, double hMax, Leaves side) {
            this.area = area;
            this.hMin = hMin;
            this.hMax = hMax > hMin ? hMax : hMin + 1;
            this.side = side;
        }

        /** Pixels between neighbouring leaves. */
        double leafSpacing() {
            return (side == Leaves.BOTTOM ? area.getWidth() : area.getHeight()) / n;
        }

        /** Pixel coordinate along the leaf axis for leaf units {@code u} (position + 0.5 for a leaf centre). */
        double along(double u) {
            return side == Leaves.BOTTOM ? area.getX() + u * area.getWidth() / n
                    : area.getY() + u * area.getHeight() / n;
        }

        /** Pixel coordinate along the height axis. */
        double across(double h) {
            double f = (h - hMin) / (hMax - hMin);
            return side == Leaves.BOTTOM ? area.getMaxY() - f * area.getHeight() : area.getMaxX() - f * area.getWidth();
        }

        Point2D point(int node) {
            return at(pos[node], tree.nodeHeight(node));
        }

        private Point2D at(double u, double h) {
            return side == Leaves.BOTTOM ? new Point2D.Double(along(u), across(h))
                    : new Point2D.Double(across(h), along(u));
        }

        /**
         * Draws the tree.
         *
         * @param colours colour per cluster label (index = label), used when a bracket lies in one cluster
         * @param mixed   colour of brackets that join clusters
         */
        void draw(Graphics2D g, Color[] colours, Color mixed, float stroke) {
            int paths = colours.length + 1;
            Path2D.Double[] lines = new Path2D.Double[paths];
            Path2D.Double[] wedges = new Path2D.Double[paths];
            for (int i = 0; i < paths; i++) {
                lines[i] = new Path2D.Double();
                wedges[i] = new Path2D.Double();
            }
            boolean dense = leafSpacing() < DENSE_PX;
            double collapseLeaves = COLLAPSE_PX / leafSpacing();
            for (int s = 0; s < n - 1; s++) {
                int node = n + s;
                if (dense && size[node] < collapseLeaves) {
                    continue;
                }
                int slot = cluster[node] + 1;
                double h = tree.heightOf(s);
                int a = tree.leftOf(s);
                int b = tree.rightOf(s);
                segment(lines[slot], pos[a], tree.nodeHeight(a), pos[a], h);
                segment(lines[slot], pos[b], tree.nodeHeight(b), pos[b], h);
                segment(lines[slot], pos[a], h, pos[b], h);
                for (int c : new int[] {a, b}) {
                    if (dense && c >= n && size[c] < collapseLeaves) {
                        wedge(wedges[cluster[c] + 1], c);
                    }
                }
            }
            g.setStroke(new BasicStroke(stroke, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER));
            for (int i = 0; i < paths; i++) {
                Color c = i == 0 ? mixed : colours[i - 1];
                g.setColor(ChartColors.tint(c, WEDGE_TINT));
                g.fill(wedges[i]);
                g.setColor(c);
                g.draw(lines[i]);
            }
        }

        private void segment(Path2D.Double p, double u0, double h0, double u1, double h1) {
            Point2D a = at(u0, h0);
            Point2D b = at(u1, h1);
            p.moveTo(a.getX(), a.getY());
            p.lineTo(b.getX(), b.getY());
        }

        /** A wedge from the span of the node's leaves at the base up to the node itself. */
        private void wedge(Path2D.Double p, int node) {
            Point2D apex = point(node);
            Point2D l = at(lo[node] + 0.1, 0);
            Point2D r = at(lo[node] + size[node] - 0.1, 0);
            p.moveTo(l.getX(), l.getY());
            p.lineTo(apex.getX(), apex.getY());
            p.lineTo(r.getX(), r.getY());
            p.closePath();
        }
    }

    Placed place(Rectangle2D area, double hMin, double hMax, Leaves side) {
        return new Placed(area, hMin, hMax, side);
    }
}
