package org.treeproof.study;

/**
 * The one test of "is there any cluster structure" that accounts for choosing among linkages and k: the largest
 * test statistic ({@link NullStability#testExcess}: stability plus separation, the observed data and the null sets
 * standardised alike) over every linkage and k of the observed data, against the same maximum on each null data
 * set. A null set with no cut anywhere reaches nothing (its maximum is minus infinity, written as null).
 *
 * <p>Two p-values, both reported. The Monte Carlo one, {@code (1 + sets reaching it) / (1 + sets)} (Hope 1968),
 * is exact for any statistic but cannot go below {@code 1 / (1 + sets)}. The fitted one reads the observed
 * maximum against a normal distribution fitted to the null sets' maxima (mean and SD), as the significance test
 * for clustering of Y. Liu, D. N. Hayes, A. Nobel and J. S. Marron, "Statistical significance of clustering for
 * high-dimension, low-sample size data", J. Am. Stat. Assoc. 103 (2008) 1281-1293,
 * doi:10.1198/016214508000000454, does with its simulated null statistics (from memory of that paper); it can
 * go below the Monte Carlo floor when the evidence is strong, and is only as good as the normal fit.
 *
 * @param statistic        the observed largest test statistic
 * @param pValue           the Monte Carlo p-value
 * @param pValueFitted     the p-value from the fitted normal distribution of the null maxima
 * @param nullSets         null data sets
 * @param replicatesPerSet replicates per null set and for the observed statistic
 * @param nullMaxima       the null sets' largest test statistic, in set order
 */
public record StructureTest(double statistic, double pValue, double pValueFitted, int nullSets, int replicatesPerSet,
        double[] nullMaxima) {
    /** The method's identifier in outputs. */
    public static final String METHOD = "max-excess-over-robust-gaussian-null";

    public StructureTest {
        nullMaxima = nullMaxima.clone();
    }

    @Override
    public double[] nullMaxima() {
        return nullMaxima.clone();
    }

    /** How many null sets reach the observed statistic: the count in the Monte Carlo p-value. */
    public int reachedBy() {
        return NullCalibration.reaching(statistic, nullMaxima);
    }

    /** The smallest Monte Carlo p-value these null sets allow, {@code 1 / (1 + sets)}. */
    public double smallestPValue() {
        return 1.0 / (1.0 + nullSets);
    }

    /** The fewest null sets whose smallest Monte Carlo p-value is at most {@code alpha}. */
    public static int setsNeededFor(double alpha) {
        return (int) Math.ceil(1.0 / alpha - 1.0 - 1e-9);
    }
}
