package org.treeproof.cli;

import org.treeproof.data.InputException;

/** The number of worker threads from an option value, defaulting to the available cores. */
final class Threads {
    private Threads() {
    }

    static int resolve(Integer requested, String option) {
        if (requested == null) {
            return Runtime.getRuntime().availableProcessors();
        }
        if (requested < 1 || requested > 1024) {
            throw new InputException(option + " must be between 1 and 1024, got " + requested);
        }
        return requested;
    }
}
