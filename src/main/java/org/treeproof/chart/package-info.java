/**
 * Charts of a study's results, drawn with XChart to PNG and SVG. The only package that imports XChart.
 */
package org.treeproof.chart;
