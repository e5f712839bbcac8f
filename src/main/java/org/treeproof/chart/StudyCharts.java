package org.treeproof.chart;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.treeproof.data.DataMatrix;
import org.treeproof.study.Evidence;
import org.treeproof.study.Recommendation;

/**
 * Draws every chart of a study from its results, for the command line and the report.
 *
 * <p>The figures, always in this order and always all returned (drawn, or skipped with a note saying why):
 * <ul>
 *   <li>{@code dendrogram}: the recommended linkage's tree coloured by the recommended cut, the cut line at
 *       the recommendation's chosen height, branch support from the replicates; with k = 1 one colour and no
 *       cut line; with branch p-values, squares at the highest forks for their AU p-value;</li>
 *   <li>{@code silhouette}: the recommended solution's silhouettes (skipped for k = 1);</li>
 *   <li>{@code stability}: mean ARI with its 95% band per linkage against k, the null data's band (of the
 *       recommended linkage, or the first that has one) and the chosen k;</li>
 *   <li>{@code gap}: the recommended linkage's gap statistic (skipped when not computed);</li>
 *   <li>{@code consensus}: the recommended linkage's consensus matrix at the recommended k in tree order;
 *       for k = 1 at the most stable k (2 if none), as its title says;</li>
 *   <li>{@code consensus-cdf}: the recommended linkage's CDF of consensus values at every k and the change in the
 *       area under it (Monti et al. 2003), the recommended k drawn in ink;</li>
 *   <li>{@code jaccard}: the recommended solution's cluster-wise Jaccard (skipped for k = 1);</li>
 *   <li>{@code linkages}: every linkage at its own best k, and how far their solutions agree;</li>
 *   <li>{@code heatmap}: the data, samples in the recommended tree's order and features clustered with
 *       Euclidean distance and average linkage (at most {@value HeatmapFeatures#MAX_FEATURES}, the most
 *       variable); only when a data table is given.</li>
 * </ul>
 * Files are named after the ids ({@code dendrogram.png}, {@code dendrogram.svg}, ...).
 *
 * <p>Degenerate results must not cost the user the rest of a long run: when a chart's input record refuses
 * the values (for instance silhouettes that are all NaN), that figure is skipped, any file it began is
 * removed, and its note carries the reason. Write failures are real and are thrown.
 *
 * <p>Rendering needs no screen. {@link #drawAll} sets the system property {@code java.awt.headless=true}
 * when the caller has not set it, before anything touches AWT: without it, a set but unreachable
 * {@code DISPLAY} can stop AWT from starting. It is a process-wide property that AWT reads once; it is set
 * here, at the one entry point, rather than as a side effect of loading a class. Callers that use the
 * renderers directly run with {@code -Djava.awt.headless=true}.
 */
public final class StudyCharts {
    /** The figure ids, in the order {@link #drawAll} returns them. */
    public static final List<String> FIGURE_IDS = List.of("dendrogram", "silhouette", "stability", "gap", "consensus",
            "consensus-cdf", "jaccard", "linkages", "heatmap");

    private StudyCharts() {
    }

    /** {@link #drawAll(Evidence, Recommendation, DataMatrix, Path, int)} on one thread. */
    public static List<Figure> drawAll(Evidence evidence, Recommendation recommendation, DataMatrix dataOrNull,
            Path chartsDir) throws IOException {
        return drawAll(evidence, recommendation, dataOrNull, chartsDir, 1);
    }

    /**
     * Draws every figure of a study into {@code chartsDir} (created if needed).
     *
     * @param evidence       the study's evidence
     * @param recommendation the recommendation drawn from it
     * @param dataOrNull     the prepared samples-by-features table the study ran on, samples in the study's
     *                       order, for the heat map; {@code null} when there is none (distances alone)
     * @param chartsDir      where the files go
     * @param threads        threads for the feature distances of the heat map (the pictures do not depend on it)
     * @return one figure per id of {@link #FIGURE_IDS}, in that order
     * @throws IllegalArgumentException if the recommendation or the data do not belong to the evidence
     * @throws IOException              if a file cannot be written
     */
    public static List<Figure> drawAll(Evidence evidence, Recommendation recommendation, DataMatrix dataOrNull,
            Path chartsDir, int threads) throws IOException {
        Objects.requireNonNull(chartsDir, "chartsDir");
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, got " + threads);
        }
        if (System.getProperty("java.awt.headless") == null) {
            System.setProperty("java.awt.headless", "true");
        }
        var inputs = new StudyChartInputs(evidence, recommendation);
        List<StudyChartInputs.Plan> plans = List.of(inputs.dendrogram(), inputs.silhouette(), inputs.stability(),
                inputs.gap(), inputs.consensus(), inputs.consensusCdf(), inputs.jaccard(), inputs.linkages(),
                inputs.heatmap(dataOrNull, threads));
        Files.createDirectories(chartsDir);
        var figures = new ArrayList<Figure>(plans.size());
        for (StudyChartInputs.Plan plan : plans) {
            figures.add(draw(plan, chartsDir));
        }
        return List.copyOf(figures);
    }

    private static Figure draw(StudyChartInputs.Plan plan, Path dir) throws IOException {
        if (plan.render() == null) {
            removeFiles(dir, plan.id());
            return new Figure(plan.id(), plan.title(), List.of(), 0, 0, plan.note());
        }
        try {
            StudyChartInputs.Drawn d = plan.render().draw(dir, plan.id());
            return new Figure(plan.id(), plan.title(), d.files(), d.width(), d.height(), plan.note());
        } catch (IllegalArgumentException refused) {
            removeFiles(dir, plan.id());
            return new Figure(plan.id(), plan.title(), List.of(), 0, 0,
                    "not drawn: the chart refused the values (" + refused.getMessage() + ")");
        }
    }

    /** Removes what a figure may have begun, so no file is left that its figure does not list. */
    private static void removeFiles(Path dir, String id) throws IOException {
        Files.deleteIfExists(dir.resolve(id + ".png"));
        Files.deleteIfExists(dir.resolve(id + ".svg"));
    }
}
