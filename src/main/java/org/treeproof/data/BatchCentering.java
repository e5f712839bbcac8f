package org.treeproof.data;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * Removes each batch's mean from every feature: within every level of a covariate that records how the samples
 * were processed (a batch, a run, a site, a date), each feature's mean over the level's samples is subtracted from
 * them, so that a shift shared by a whole batch no longer sets its samples apart. This is batch mean-centring as
 * in A. H. Sims, G. J. Smethurst, Y. Hey, M. J. Okoniewski, S. D. Pepper, A. Howell, C. J. Miller and
 * R. B. Clarke, "The removal of multiplicative, systematic bias allows integration of breast cancer gene
 * expression datasets - improving meta-analysis and prediction of prognosis", BMC Med. Genomics 1 (2008) 42,
 * doi:10.1186/1755-8794-1-42 (there applied to log-scale expression values, as {@link Preparation} does after
 * {@code log2}).
 *
 * <p>What it costs: when groups are spread unevenly over the batches, part of a group's difference is a batch
 * mean, and removing it shrinks the difference (V. Nygaard, E. A. Rødland and E. Hovig, "Methods that remove batch
 * effects while retaining group differences may lead to exaggerated confidence in downstream analyses",
 * Biostatistics 17 (2016) 29-39, doi:10.1093/biostatistics/kxv027, who show that adjustments that keep known
 * groups instead exaggerate them; here no group is known, so none is kept). Groups present in every batch in like
 * shares keep their difference. Only the batch means are removed, not a batch's spread.
 *
 * <p>A level with a single sample is refused (centring would set all its values to 0), and so is a column with
 * one level among the samples (there is nothing to remove).
 *
 * @param column the covariate's name, for messages and the report
 * @param levels every sample's level, by sample id (held sorted by id, so that the settings print alike in every
 *               run)
 */
public record BatchCentering(String column, SortedMap<String, String> levels) {

    public BatchCentering {
        Objects.requireNonNull(column, "column");
        Objects.requireNonNull(levels, "levels");
        levels = Collections.unmodifiableSortedMap(new TreeMap<>(levels));
    }

    /** The centring by {@code column}, whose level for each sample id is in {@code levels}. */
    public static BatchCentering of(String column, Map<String, String> levels) {
        return new BatchCentering(column, new TreeMap<>(levels));
    }

    /** How many distinct levels the column has over every sample named. */
    public int levelCount() {
        return (int) levels.values().stream().distinct().count();
    }

    /** What this step did, as a sentence for reports. */
    public String sentence() {
        return String.format(Locale.ROOT, "Removed each level's mean of the covariate '%s' (%d levels) from every "
                + "feature (batch mean-centring).", column, levelCount());
    }

    /**
     * Centres every feature of the run's table within each level.
     *
     * @throws InputException when a sample has no level, a level holds a single sample, or the samples hold one
     *                        level only
     */
    void apply(PreparationRun run) {
        WorkingTable t = run.table;
        int n = t.samples();
        var members = new LinkedHashMap<String, List<Integer>>();
        for (int i = 0; i < n; i++) {
            String level = levels.get(t.sample(i));
            if (level == null) {
                throw new InputException("--center-within " + column + ": sample '" + t.sample(i) + "' has no value in "
                        + "that column; give every sample its batch");
            }
            members.computeIfAbsent(level, k -> new ArrayList<>()).add(i);
        }
        if (members.size() < 2) {
            throw new InputException("--center-within " + column + ": every sample is in the one level '"
                    + members.keySet().iterator().next() + "'; there is no batch difference to remove");
        }
        for (var e : members.entrySet()) {
            if (e.getValue().size() == 1) {
                throw new InputException("--center-within " + column + ": level '" + e.getKey() + "' holds only "
                        + "sample '" + t.sample(e.getValue().get(0)) + "', and centring would set all its values to "
                        + "0; merge the level with another or leave the sample out");
            }
        }
        for (int j = 0; j < t.features(); j++) {
            for (List<Integer> rows : members.values()) {
                double sum = 0;
                for (int i : rows) {
                    sum += t.get(i, j);
                }
                double mean = sum / rows.size();
                for (int i : rows) {
                    t.set(i, j, t.get(i, j) - mean);
                }
            }
        }
        run.refuseNonFinite("centring within --center-within " + column);
    }
}
