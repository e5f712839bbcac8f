package org.treeproof.report;

import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.treeproof.explain.Explanation;
import org.treeproof.partition.Partition;
import org.treeproof.score.JaccardStability;
import org.treeproof.study.ClusterBranch;
import org.treeproof.study.ClusterEvidence;
import org.treeproof.study.DecisionRule;
import org.treeproof.study.Evidence;
import org.treeproof.study.Recommendation;
import org.treeproof.study.StudySettings;
import org.treeproof.tree.Linkage;

/**
 * Everything a report shows, decided once, so that the Markdown methods paragraph, the HTML report and the
 * charts are renderers of one model and cannot disagree.
 *
 * @param run             the facts of the run (tool, input, command line, seed, threads, time)
 * @param settings        the study's effective settings
 * @param rule            the decision thresholds used
 * @param decision        the decision and its reasons
 * @param evidence        the evidence by k, one table per linkage in the order of the settings
 * @param linkages        the linkage comparison
 * @param clusters        every cluster of the recommended solution with its stability (empty when unsupported)
 * @param flaggedSamples  the samples flagged in the recommended solution, in input order
 * @param labels          the comparison with known classes, or {@code null} when none were given
 * @param effectiveSettings every effective setting as a name and a printable value, in a fixed order
 * @param caution         what the evidence does not show
 * @param figures         the charts, in {@link Figure#IDS} order, without those whose data is missing
 * @param notes           plain sentences on what was left out and why
 * @param explanation     what sets the recommended clusters apart, the covariates and the alternative analyses;
 *                        {@code null} when the study was not explained
 * @param clusterBranches the branch of each recommended cluster with its AU p-value (empty when branch p-values
 *                        were not computed or no clusters are recommended)
 */
public record ReportModel(RunInfo run, StudySettings settings, DecisionRule rule, Decision decision,
        List<EvidenceTable> evidence, LinkageComparison linkages, List<ClusterEvidence> clusters,
        List<Recommendation.SampleFlag> flaggedSamples, LabelComparison labels, List<Setting> effectiveSettings,
        String caution, List<Figure> figures, List<String> notes, Explanation explanation,
        List<ClusterBranch> clusterBranches) {

    /** A model without an explanation or branch p-values. */
    public ReportModel(RunInfo run, StudySettings settings, DecisionRule rule, Decision decision,
            List<EvidenceTable> evidence, LinkageComparison linkages, List<ClusterEvidence> clusters,
            List<Recommendation.SampleFlag> flaggedSamples, LabelComparison labels, List<Setting> effectiveSettings,
            String caution, List<Figure> figures, List<String> notes) {
        this(run, settings, rule, decision, evidence, linkages, clusters, flaggedSamples, labels, effectiveSettings,
                caution, figures, notes, null, List.of());
    }

    public ReportModel {
        clusterBranches = List.copyOf(clusterBranches);
        Objects.requireNonNull(run, "run");
        Objects.requireNonNull(settings, "settings");
        Objects.requireNonNull(rule, "rule");
        Objects.requireNonNull(decision, "decision");
        Objects.requireNonNull(linkages, "linkages");
        Objects.requireNonNull(caution, "caution");
        evidence = List.copyOf(evidence);
        clusters = List.copyOf(clusters);
        flaggedSamples = List.copyOf(flaggedSamples);
        effectiveSettings = List.copyOf(effectiveSettings);
        figures = List.copyOf(figures);
        notes = List.copyOf(notes);
        if (evidence.isEmpty() || evidence.size() != linkages.rows().size()) {
            throw new IllegalArgumentException("one evidence table and one comparison row per linkage");
        }
        if (run.seed() != settings.seed()) {
            throw new IllegalArgumentException("the run's seed " + run.seed() + " is not the study's " + settings.seed());
        }
        if (labels != null && labels.clusters() != decision.k()) {
            throw new IllegalArgumentException("the label comparison has " + labels.clusters()
                    + " clusters; the decision has " + decision.k());
        }
        var seen = new HashSet<String>();
        int last = -1;
        for (Figure f : figures) {
            int at = Figure.IDS.indexOf(f.id());
            if (!seen.add(f.id()) || at < last) {
                throw new IllegalArgumentException("figures must be distinct and in the order " + Figure.IDS);
            }
            last = at;
        }
    }

    /**
     * The model of a study without known classes.
     *
     * @throws IllegalArgumentException if the recommendation or the run do not belong to the evidence
     */
    public static ReportModel of(Evidence evidence, Recommendation recommendation, RunInfo run) {
        return of(evidence, recommendation, run, null);
    }

    /**
     * The model of a study.
     *
     * @param labels the comparison with known classes, or {@code null} when none were given
     * @throws IllegalArgumentException if the recommendation, the run or the labels do not belong to the evidence
     */
    public static ReportModel of(Evidence evidence, Recommendation recommendation, RunInfo run, LabelComparison labels) {
        return of(evidence, recommendation, run, labels, null);
    }

    /**
     * The model of a study with the explanation of its recommended solution.
     *
     * @param explanation the explanation, or {@code null} when there is none
     */
    public static ReportModel of(Evidence evidence, Recommendation recommendation, RunInfo run, LabelComparison labels,
            Explanation explanation) {
        return new ModelFactory(evidence, recommendation, run).build(labels, explanation);
    }

    /** The explanation of the recommended solution, if the study was explained. */
    public Optional<Explanation> explained() {
        return Optional.ofNullable(explanation);
    }

    /** The evidence table of a linkage. */
    public EvidenceTable table(Linkage linkage) {
        return evidence.stream().filter(t -> t.linkage() == linkage).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no evidence for " + linkage.id() + " linkage"));
    }

    /** The recommended solution's row; empty when the verdict is unsupported. */
    public Optional<EvidenceRow> recommendedRow() {
        return decision.hasClusters() ? table(decision.linkage()).recommended() : Optional.empty();
    }

    /** The comparison with known classes, if classes were given. */
    public Optional<LabelComparison> labelComparison() {
        return Optional.ofNullable(labels);
    }

    /** The clusters below Hennig's stable band. */
    public List<ClusterEvidence> flaggedClusters() {
        return clusters.stream().filter(c -> c.status() != JaccardStability.Status.STABLE).toList();
    }

    /** Whether stability was calibrated against null data. */
    public boolean nullCalibrated() {
        return decision.structureTest() != null;
    }

    /** Whether the gap statistic was computed. */
    public boolean gapComputed() {
        return evidence.get(0).hasGap();
    }

    /** Whether the study had a data table (not distances alone). */
    public boolean hasData() {
        return run.features() > 0;
    }

    /** The figure with this id, if the model shows it. */
    public Optional<Figure> figure(String id) {
        return figures.stream().filter(f -> f.id().equals(id)).findFirst();
    }

    /**
     * One effective setting.
     *
     * @param name  a plain name
     * @param value its value as printed
     */
    public record Setting(String name, String value) {
        public Setting {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(value, "value");
        }
    }
}
