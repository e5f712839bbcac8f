package org.treeproof.chart;

import java.awt.Graphics2D;

/** Draws one chart onto a surface of the chart's size, whether a raster image or a vector document. */
@FunctionalInterface
interface Painter {
    void paint(Graphics2D g);
}
