package org.treeproof.explain;

import java.util.Arrays;
import java.util.Objects;

/**
 * One covariate of the samples, in the samples' input order. A categorical covariate holds a category per
 * sample ({@code null} when missing); a numeric one a number ({@code NaN} when missing).
 *
 * @param name       the column's name
 * @param kind       categorical or numeric
 * @param categories per sample, for a categorical covariate; {@code null} for a numeric one
 * @param values     per sample, for a numeric covariate; {@code null} for a categorical one
 */
public record Covariate(String name, CovariateKind kind, String[] categories, double[] values) {

    public Covariate {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(kind, "kind");
        if ((kind == CovariateKind.CATEGORICAL) != (categories != null) || (categories == null) == (values == null)) {
            throw new IllegalArgumentException("a categorical covariate has categories, a numeric one values");
        }
        categories = categories == null ? null : categories.clone();
        values = values == null ? null : values.clone();
        if (values != null) {
            for (double v : values) {
                if (Double.isInfinite(v)) {
                    throw new IllegalArgumentException("covariate values are finite or NaN (missing)");
                }
            }
        }
    }

    public static Covariate categorical(String name, String[] categories) {
        return new Covariate(name, CovariateKind.CATEGORICAL, categories, null);
    }

    public static Covariate numeric(String name, double[] values) {
        return new Covariate(name, CovariateKind.NUMERIC, null, values);
    }

    /** The number of samples. */
    public int samples() {
        return kind == CovariateKind.CATEGORICAL ? categories.length : values.length;
    }

    /** Whether sample {@code i} has no value. */
    public boolean missing(int i) {
        return kind == CovariateKind.CATEGORICAL ? categories[i] == null : Double.isNaN(values[i]);
    }

    @Override
    public String[] categories() {
        return categories == null ? null : categories.clone();
    }

    @Override
    public double[] values() {
        return values == null ? null : values.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Covariate c && c.name.equals(name) && c.kind == kind
                && Arrays.equals(c.categories, categories) && Arrays.equals(c.values, values);
    }

    @Override
    public int hashCode() {
        return Objects.hash(name, kind, Arrays.hashCode(categories), Arrays.hashCode(values));
    }

    @Override
    public String toString() {
        return "Covariate[" + name + ", " + kind.id() + "]";
    }
}
