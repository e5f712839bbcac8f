package org.treeproof.study;

import java.util.List;
import org.treeproof.tree.Linkage;

/**
 * One reason behind a recommendation, as typed facts. The decision rule and {@link Recommender} make them; the
 * report words them ({@code org.treeproof.report.ReasonWords}), so no sentence is re-parsed and no verdict is
 * re-derived downstream.
 */
public sealed interface Reason {

    /** Dispatches to the visitor's method for this kind of reason. */
    <T> T accept(Visitor<T> v);

    /** The kind's identifier in outputs. */
    String kind();

    /** One method per kind of reason. */
    interface Visitor<T> {
        T structure(Structure r);

        T noNullData(NoNullData r);

        T chosen(Chosen r);

        T bestFailed(BestFailed r);

        T outliers(Outliers r);

        T gap(Gap r);

        T votes(Votes r);

        T levels(Levels r);

        T tieDependent(TieDependent r);

        T inversions(Inversions r);

        T otherLinkages(OtherLinkages r);

        T criteria(Criteria r);
    }

    /**
     * The outcome of the structure test.
     *
     * @param clustersFound whether some solution with clusters passed the rule; when the test rejects the null but
     *                      none did, the data depart from the null in a way that is not stable, cohesive clusters
     */
    record Structure(StructureTest test, double alpha, boolean clustersFound) implements Reason {
        public boolean found() {
            return test.pValue() <= alpha + 1e-12;
        }

        @Override
        public <T> T accept(Visitor<T> v) {
            return v.structure(this);
        }

        @Override
        public String kind() {
            return "structure-test";
        }
    }

    /** No null data could be run (a distance table) or were asked for ({@code --null-sets 0}). */
    record NoNullData(boolean distancesOnly) implements Reason {
        @Override
        public <T> T accept(Visitor<T> v) {
            return v.noNullData(this);
        }

        @Override
        public String kind() {
            return "no-null-data";
        }
    }

    /** The recommended solution and the figures that carried it. */
    record Chosen(Assessment assessment, KEvidence evidence) implements Reason {
        @Override
        public <T> T accept(Visitor<T> v) {
            return v.chosen(this);
        }

        @Override
        public String kind() {
            return "chosen";
        }
    }

    /** With an unsupported verdict: the strongest solution of one linkage and the conditions it failed. */
    record BestFailed(Assessment assessment) implements Reason {
        @Override
        public <T> T accept(Visitor<T> v) {
            return v.bestFailed(this);
        }

        @Override
        public String kind() {
            return "best-failed";
        }
    }

    /**
     * Samples set aside as outliers in the recommended solution.
     *
     * @param count          all of them
     * @param minClusterSize the fewest samples a cluster holds
     * @param afterCut       how many of them were set aside after the assessed cut, as far from their cluster
     *                       ({@code Recommender}'s far samples): the cut's figures include them
     * @param samples        the samples studied
     */
    record Outliers(int count, int minClusterSize, int afterCut, int samples) implements Reason {
        @Override
        public <T> T accept(Visitor<T> v) {
            return v.outliers(this);
        }

        @Override
        public String kind() {
            return "outliers";
        }
    }

    /** The gap statistic's own choice of k beside the recommended one. */
    record Gap(int gapK, boolean ruleMet, int recommendedK) implements Reason {
        public boolean agrees() {
            return gapK == recommendedK;
        }

        @Override
        public <T> T accept(Visitor<T> v) {
            return v.gap(this);
        }

        @Override
        public String kind() {
            return "gap";
        }
    }

    /**
     * How often each k wins when the rule's ordering is applied replicate by replicate, among the linkage's
     * solutions that have the recommended verdict: supported ones by fineness (the finest a replicate reproduces,
     * its ARI at least {@code reproducedAt}), tentative ones by excess ({@code Recommender}'s votes).
     */
    record Votes(Linkage linkage, Verdict verdict, List<Recommendation.KShare> shares, int recommendedK,
            double reproducedAt) implements Reason {
        public Votes {
            shares = List.copyOf(shares);
        }

        @Override
        public <T> T accept(Visitor<T> v) {
            return v.votes(this);
        }

        @Override
        public String kind() {
            return "replicate-votes";
        }
    }

    /** Nested levels of the recommended linkage. */
    record Levels(List<Integer> levels) implements Reason {
        public Levels {
            levels = List.copyOf(levels);
        }

        @Override
        public <T> T accept(Visitor<T> v) {
            return v.levels(this);
        }

        @Override
        public String kind() {
            return "levels";
        }
    }

    /** Tied merge heights at the cut. */
    record TieDependent(int k) implements Reason {
        @Override
        public <T> T accept(Visitor<T> v) {
            return v.tieDependent(this);
        }

        @Override
        public String kind() {
            return "tie-dependent";
        }
    }

    /** The recommended tree has inversions. */
    record Inversions(Linkage linkage, int k) implements Reason {
        @Override
        public <T> T accept(Visitor<T> v) {
            return v.inversions(this);
        }

        @Override
        public String kind() {
            return "inversions";
        }
    }

    /**
     * What the other linkages choose.
     *
     * @param recommended  the recommended linkage
     * @param recommendedK the recommended k
     * @param others      each other linkage's own choice
     * @param nesting     per other linkage, {@link org.treeproof.partition.Clustering#nesting} of its choice with the
     *                    recommended solution; NaN when it finds no convincing k or chooses the same k
     */
    record OtherLinkages(Linkage recommended, int recommendedK, List<Recommendation.LinkageSummary> others,
            List<Double> nesting)
            implements Reason {
        public OtherLinkages {
            others = List.copyOf(others);
            nesting = List.copyOf(nesting);
            if (nesting.size() != others.size()) {
                throw new IllegalArgumentException(others.size() + " linkages, " + nesting.size() + " nestings");
            }
        }

        @Override
        public <T> T accept(Visitor<T> v) {
            return v.otherLinkages(this);
        }

        @Override
        public String kind() {
            return "other-linkages";
        }
    }

    /**
     * Criteria whose own choice of k differs from the recommended k, with the rule's assessment of the recommended
     * linkage at each k (to say why a criterion's k lost).
     */
    record Criteria(List<Recommendation.CriterionChoice> disagreeing, int recommendedK, List<Assessment> linkage)
            implements Reason {
        public Criteria {
            disagreeing = List.copyOf(disagreeing);
            linkage = List.copyOf(linkage);
        }

        @Override
        public <T> T accept(Visitor<T> v) {
            return v.criteria(this);
        }

        @Override
        public String kind() {
            return "criteria";
        }
    }
}
