/**
 * The report model built from a study's results and its text renderers: the Markdown methods paragraph and the self-contained HTML report.
 */
package org.treeproof.report;
