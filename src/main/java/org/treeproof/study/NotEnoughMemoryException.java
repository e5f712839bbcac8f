package org.treeproof.study;

/**
 * The study estimated, before allocating, that the heap cannot hold what the requested size needs.
 * The message gives the estimate, the heap available and what to change. The command line exits with 3.
 */
public final class NotEnoughMemoryException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public NotEnoughMemoryException(String message) {
        super(message, null, false, false);
    }
}
