package org.treeproof.study;

/**
 * Hears how far a study is. Called on the thread that runs the study, in order; implementations
 * must be cheap. The study never prints; the command line turns this into a progress bar or log lines.
 */
public interface StudyProgress {
    /** A stage of {@code total} steps begins. */
    void stage(String name, int total);

    /** One step of the current stage is done. */
    void step();

    /** Hears nothing. */
    StudyProgress SILENT = new StudyProgress() {
        @Override
        public void stage(String name, int total) {
        }

        @Override
        public void step() {
        }
    };
}
