package org.treeproof.study;

/** How well the evidence supports a cluster solution; see {@link DecisionRule} for the exact rule. */
public enum Verdict {
    /** Stability beats the null, every cluster is stable, and the clusters are well separated. */
    SUPPORTED("supported"),
    /** Stability beats the null and no cluster dissolves, but a cluster is only doubtful or the fit is weak. */
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
