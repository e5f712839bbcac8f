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
 * <p>{@link org.treeproof.chart.StudyCharts#drawAll} draws every figure of a study from its
 * {@code Evidence} and {@code Recommendation} and returns one {@link org.treeproof.chart.Figure} per fixed id,
 * drawn or skipped with the reason.
 *
 * <p>Rendering is headless and deterministic: the same input gives the same PNG bytes. {@code StudyCharts}
 * sets {@code java.awt.headless=true} at its entry when the caller has not chosen; callers of the renderers
 * themselves run with {@code -Djava.awt.headless=true} (the build's tests do).
 */
package org.treeproof.chart;
