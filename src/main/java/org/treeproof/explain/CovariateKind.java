package org.treeproof.explain;

import java.util.Locale;
import org.treeproof.data.InputException;

/** Whether a covariate's values are categories (batch, site, sex) or numbers (age, RNA quality). */
public enum CovariateKind {
    /** Categories: tested with a contingency table against the clusters. */
    CATEGORICAL("categorical"),
    /** Numbers: tested by their ranks across the clusters. */
    NUMERIC("numeric");

    /**
     * A column whose present values are all numbers is read as numeric only when it has more than this many
     * distinct values; fewer are taken for codes of categories (0/1 for sex, 1/2/3 for a batch). A convention of
     * ours, not from a publication; {@code --covariate-kind} overrides it per column.
     */
    public static final int MOST_CODED_LEVELS = 5;

    private final String id;

    CovariateKind(String id) {
        this.id = id;
    }

    public String id() {
        return id;
    }

    /**
     * The kind with this name (case-insensitive; {@code category}, {@code number} accepted too).
     *
     * @throws InputException for an unknown name
     */
    public static CovariateKind parse(String name) {
        return switch (name.strip().toLowerCase(Locale.ROOT)) {
            case "categorical", "category", "factor" -> CATEGORICAL;
            case "numeric", "number", "continuous" -> NUMERIC;
            default -> throw new InputException("unknown covariate kind '" + name + "'; use categorical or numeric");
        };
    }
}
