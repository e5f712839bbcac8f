package org.treeproof.data;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The working state of one {@link Preparation#apply}: the table being changed, where its cells came from, and
 * the account of what was done so far. The steps ({@link MissingPolicy}, {@link Scale}) act on it.
 */
final class PreparationRun {
    final WorkingTable table;
    final CellLocator where;
    private final List<PreparationReport.Removal> droppedSamples = new ArrayList<>();
    private final List<PreparationReport.Removal> droppedFeatures = new ArrayList<>();
    private long imputedCells;
    private int imputedFeatures;
    private PreparationReport.TopVariable topVariable;
    private PreparationReport.SizeFactors sizeFactors;
    private PreparationReport.Totals countTotals;

    PreparationRun(DataMatrix input, CellLocator where) {
        this.table = new WorkingTable(input);
        this.where = where;
    }

    /** Drops the features with {@code drop[j]}, recording each with its reason and missing count. */
    void dropFeatures(boolean[] drop, PreparationReport.Reason reason, int[] missing) {
        boolean[] keep = new boolean[drop.length];
        for (int j = 0; j < drop.length; j++) {
            keep[j] = !drop[j];
            if (drop[j]) {
                droppedFeatures.add(new PreparationReport.Removal(table.feature(j), reason, missing[j]));
            }
        }
        table.keepFeatures(keep);
    }

    /** Drops the samples with {@code drop[i]}, recording each with its missing count. */
    void dropSamples(boolean[] drop, PreparationReport.Reason reason, int[] missing) {
        boolean[] keep = new boolean[drop.length];
        for (int i = 0; i < drop.length; i++) {
            keep[i] = !drop[i];
            if (drop[i]) {
                droppedSamples.add(new PreparationReport.Removal(table.sample(i), reason, missing[i]));
            }
        }
        table.keepSamples(keep);
    }

    void imputed(long cells, int features) {
        imputedCells += cells;
        imputedFeatures += features;
    }

    void topVariable(PreparationReport.TopVariable t) {
        topVariable = t;
    }

    void librarySizes(PreparationReport.SizeFactors f) {
        sizeFactors = f;
    }

    void countTotals(PreparationReport.Totals t) {
        countTotals = t;
    }

    /**
     * Refuses a table in which {@code step} made a value too large for a double, naming the first such cell.
     *
     * @throws InputException naming file, line and column of the cell
     */
    void refuseNonFinite(String step) {
        refuseNonFinite(step, "rescale the feature (e.g. --log2) first");
    }

    /** As {@link #refuseNonFinite(String)}, with {@code remedy} as the advice. */
    void refuseNonFinite(String step, String remedy) {
        int[] at = table.first(x -> !Double.isFinite(x), where.featureMajor());
        if (at != null) {
            throw new InputException(locate(at[0], at[1]) + ": " + step + " makes this value " + names(at[0], at[1])
                    + " too large for a double; " + remedy);
        }
    }

    /** The location of cell {@code (i, j)} of the working table and its names, e.g. {@code data.csv:7:3}. */
    String locate(int i, int j) {
        return where.locate(table.sample(i), table.feature(j));
    }

    /** "(sample 'S6', feature 'G2')" for cell {@code (i, j)} of the working table. */
    String names(int i, int j) {
        return "(sample '" + table.sample(i) + "', feature '" + table.feature(j) + "')";
    }

    PreparationReport report(Preparation settings, DataMatrix input, long missingCells) {
        return new PreparationReport(settings, input.samples(), input.features(), missingCells, droppedSamples,
                droppedFeatures, imputedCells, imputedFeatures, Optional.ofNullable(topVariable), table.samples(),
                table.features(), Optional.ofNullable(sizeFactors), Optional.ofNullable(countTotals));
    }
}
