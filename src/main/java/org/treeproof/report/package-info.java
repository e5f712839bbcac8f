/**
 * The report of a study, built as a model first and rendered from it.
 *
 * <p>{@link org.treeproof.report.ReportModel#of} turns a study's {@code Evidence} and {@code Recommendation}, the
 * run's {@link org.treeproof.report.RunInfo} and, with {@code --labels}, a
 * {@link org.treeproof.report.LabelComparison} into immutable records: the decision, the evidence by k per linkage,
 * the linkage comparison, cluster and sample flags, every effective setting, the caution, and the fixed list of
 * {@link org.treeproof.report.Figure}s the chart package draws. Two renderers read only the model:
 * {@link org.treeproof.report.MethodsParagraph} ({@code methods.md}, deterministic for a given study) and
 * {@link org.treeproof.report.HtmlReport} ({@code report.html}, self-contained, charts embedded as
 * {@link org.treeproof.report.EmbeddedImage} data URIs). No file I/O happens here: callers write the strings.
 */
package org.treeproof.report;
