/**
 * Charts of a study's results, written as PNG (and SVG where a vector copy helps). The only package that
 * imports XChart and VectorGraphics2D.
 *
 * <p>Each chart is a pair: an input record of plain arrays, lists and strings that validates and copies what
 * it is given ({@link org.treeproof.chart.DendrogramInput}, {@link org.treeproof.chart.SilhouetteInput},
 * {@link org.treeproof.chart.StabilityInput}, {@link org.treeproof.chart.GapInput},
 * {@link org.treeproof.chart.ConsensusInput}, {@link org.treeproof.chart.JaccardInput},
 * {@link org.treeproof.chart.LinkageComparisonInput}, {@link org.treeproof.chart.DataHeatmapInput}), and a
 * renderer bound to one input whose {@code write(dir, baseName)} writes the files and returns their names.
 * The line charts with error bars and bands are drawn with XChart; trees, silhouettes, bars against bands
 * and heat maps are drawn directly with Java 2D in the same look ({@code Look}), since they need exact
 * control of thousands of marks. Colours: {@link org.treeproof.chart.ChartColors} and
 * {@link org.treeproof.chart.ColorScale}.
 *
 * <p>Rendering is headless (set {@code java.awt.headless=true}) and deterministic: the same input gives the
 * same PNG bytes.
 */
package org.treeproof.chart;
