package org.treeproof.cli;

import java.util.ArrayList;
import java.util.List;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.Preparation;
import org.treeproof.explain.ContrastTest;
import org.treeproof.explain.Covariate;
import org.treeproof.explain.CovariateAssociation;
import org.treeproof.explain.Explanation;
import org.treeproof.explain.FeatureContrast;
import org.treeproof.explain.FeatureTable;
import org.treeproof.explain.Sensitivity;
import org.treeproof.explain.SensitivityResult;
import org.treeproof.explain.Solution;
import org.treeproof.io.LoadedInput;
import org.treeproof.study.Evidence;
import org.treeproof.study.Recommendation;

/** Explains the recommended solution after a study: the features, the covariates and the sensitivity runs. */
final class ExplainRun {
    private ExplainRun() {
    }

    /**
     * The recommended solution as the explanation takes it: labels in input order, clusters {@code 1..k}, 0 for a
     * sample set aside as an outlier; {@code null} when no solution with clusters is recommended. This is the one
     * place that reads the solution from the recommendation.
     */
    static int[] recommendedLabels(Evidence evidence, Recommendation rec) {
        if (rec.k() < 2) {
            return null;
        }
        // the recommendation's clustering: -1 for an outlier, so +1 gives 0 for outliers and 1..k for clusters
        int[] labels = rec.clustering().labels();
        for (int i = 0; i < labels.length; i++) {
            labels[i]++;
        }
        return labels;
    }

    /**
     * The explanation.
     *
     * @param covariates the covariates read, or {@code null} when none were given
     * @param raw        the data as read, before preparation, when sensitivity runs are asked for; else {@code null}
     */
    static Explanation explain(LoadedInput loaded, Evidence evidence, Recommendation rec, ContrastTest test,
            List<Covariate> covariates, DataMatrix raw, Preparation preparation, int threads) {
        var notes = new ArrayList<String>();
        int[] labels = recommendedLabels(evidence, rec);
        if (labels == null) {
            notes.add("No solution with clusters is recommended, so there is nothing to explain: features, covariates "
                    + "and alternative analyses were not compared.");
            return new Explanation(null, null, covariates == null ? null : List.of(), null, notes);
        }
        Solution solution = Solution.of(labels);
        FeatureTable features = null;
        if (loaded.matrix().isPresent()) {
            features = FeatureContrast.of(loaded.matrix().get(), solution, test, threads).compute();
        } else {
            notes.add("Only distances were given, so no features could be compared between the clusters.");
        }
        var cov = covariates == null ? null
                : CovariateAssociation.of(solution, covariates, evidence.settings().seed()).compute();
        SensitivityResult sensitivity = null;
        if (raw != null) {
            sensitivity = Sensitivity.of(raw, preparation, evidence.settings().metric(), rec.linkage(), solution,
                    evidence.sampleIds(), rec.rule().stableJaccard(), threads).compute();
        }
        return new Explanation(solution, features, cov, sensitivity, notes);
    }
}
