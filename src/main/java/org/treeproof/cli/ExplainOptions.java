package org.treeproof.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.treeproof.explain.ContrastTest;
import org.treeproof.explain.CovariateKind;
import org.treeproof.io.CovariatesReader;
import picocli.CommandLine.Option;

/** The options that explain and stress-test the recommended solution (a picocli mixin of {@code assess}). */
final class ExplainOptions {

    @Option(names = "--feature-test", paramLabel = "TEST", description = "Test of each feature between a cluster and "
            + "the rest: wilcoxon (rank-sum, default) or welch (Welch's t).")
    String featureTest;

    @Option(names = "--covariates", paramLabel = "FILE", description = "Covariates of the samples (id column, then one "
            + "column per covariate such as batch, site, sex, age; missing values allowed; delimiter from the file "
            + "name) to test against the recommended clusters; writes covariates.csv.")
    Path covariates;

    @Option(names = "--covariate-kind", paramLabel = "NAME=KIND", split = ",", description = "Declare a covariate "
            + "categorical or numeric instead of detecting it (numbers with more than "
            + CovariateKind.MOST_CODED_LEVELS + " distinct values are numeric).")
    List<String> covariateKinds;

    @Option(names = "--sensitivity", description = "Rerun the recommended linkage at the recommended k under the other "
            + "scalings, log2 on/off, the other --library-size methods (when one was given, or log2 is taken of "
            + "counts), half and double --top-variable, and the other valid dissimilarities; writes sensitivity.csv.")
    boolean sensitivity;

    /** The test asked for; Wilcoxon by default. */
    ContrastTest test() {
        return featureTest == null ? ContrastTest.WILCOXON : ContrastTest.parse(featureTest);
    }

    /** The declared kinds, by covariate name. */
    Map<String, CovariateKind> kinds() {
        if (covariateKinds != null && covariates == null) {
            throw new org.treeproof.data.InputException("--covariate-kind needs --covariates FILE");
        }
        return covariateKinds == null ? Map.of() : CovariatesReader.kinds(covariateKinds);
    }
}
