package org.treeproof.study;

/** How well the evidence supports a cluster solution; see {@link DecisionRule} for the exact rule. */
public enum Verdict {
    /** Beats the null, and every cluster is cohesive and stable. */
    SUPPORTED("supported"),
    /**
     * Beats the null, every cluster is cohesive, and one cluster is only doubtful, the others stable; without null
     * data, the best verdict there is (every cluster stable, reproduced and separated).
     */
    TENTATIVE("tentative"),
    /** No solution with more than one cluster is convincing. */
    UNSUPPORTED("unsupported");

    private final String id;

    Verdict(String id) {
        this.id = id;
    }

    public String id() {
        return id;
    }

    /** Whether this verdict is better than {@code other}. */
    public boolean betterThan(Verdict other) {
        return ordinal() < other.ordinal();
    }
}
