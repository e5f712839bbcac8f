package org.treeproof.study;

import java.util.List;

/**
 * Where a study keeps the work it has finished, so that a run that is killed can be resumed without redoing it.
 *
 * <p>A study hands over every finished unit of work in index order; on resume it replays what was kept, in the
 * same order, through the same accumulation, and continues with the next index, so the resumed result is
 * identical to an uninterrupted one. The study itself does no I/O; the command line supplies a file-backed
 * implementation.
 */
public interface Checkpoint {

    /** The stages whose work is kept. */
    enum Stage {
        /** Stability replicates of the observed data. */
        REPLICATES,
        /** Null data sets (each kept as its per-linkage, per-k mean ARI and PAC). */
        NULL_SETS,
        /** Gap-statistic reference sets (each kept as its per-linkage log W_k). */
        GAP_SETS,
        /** Multiscale bootstrap replicates (each kept as the clades of every linkage's tree it reproduced). */
        MULTISCALE
    }

    /** Replicate outcomes kept from an earlier run, in index order from 0 (possibly none). */
    List<ReplicateOutcome> replicates();

    /** A replicate finished; called in index order. */
    void replicateDone(ReplicateOutcome outcome);

    /** Rows of numbers kept for a numeric stage, in index order from 0 (possibly none). */
    List<double[]> rows(Stage stage);

    /** Row {@code index} of a numeric stage finished; called in index order. */
    void rowDone(Stage stage, int index, double[] row);

    /** Keeps nothing. */
    Checkpoint NONE = new Checkpoint() {
        @Override
        public List<ReplicateOutcome> replicates() {
            return List.of();
        }

        @Override
        public void replicateDone(ReplicateOutcome outcome) {
        }

        @Override
        public List<double[]> rows(Stage stage) {
            return List.of();
        }

        @Override
        public void rowDone(Stage stage, int index, double[] row) {
        }
    };
}
