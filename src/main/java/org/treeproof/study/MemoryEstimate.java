package org.treeproof.study;

import java.util.Locale;
import org.treeproof.distance.CondensedDistances;
import org.treeproof.score.ConsensusAccumulator;

/**
 * The heap a study needs at its peak, estimated before anything large is allocated, so that a study too big
 * for the heap stops at once with advice instead of failing hours later with an OutOfMemoryError.
 *
 * <p>What stays for the whole run: the data table, the full distance matrix, and per linkage the consensus
 * counters (one or two bytes per pair and k). On top of it, the largest of the four phases: stability
 * replicates (per running replicate a gathered distance matrix and the linkage's working copy of it), null
 * calibration (a null data set, its distances and consensus counters, plus running replicates), the multiscale
 * bootstrap for branch p-values (per running replicate the distances over all samples, a working copy and the drawn
 * feature columns) and the gap
 * statistic (per running reference set its data, distances and a working copy).
 *
 * @param persistent bytes held for the whole run
 * @param peakPhase  bytes of the largest phase on top of them
 * @param phase      which phase that is
 */
public record MemoryEstimate(long persistent, long peakPhase, String phase) {

    /** The estimate for a study of {@code n} samples and {@code p} features run on {@code threads} threads. */
    public static MemoryEstimate of(int n, int p, StudySettings s, int threads, boolean hasData) {
        int links = s.linkages().size();
        long data = 8L * n * p;
        long distances = CondensedDistances.bytesFor(n);
        long consensus = links * ConsensusAccumulator.bytesFor(n, s.maxK(), s.replicates());
        long persistent = data + distances + consensus;
        int m = s.resampling() == org.treeproof.resample.Resampling.SUBSAMPLE
                ? (int) Math.round(s.sampleFraction() * n) : n;
        long perReplicate = 2 * CondensedDistances.bytesFor(m) + 64L * m * (s.maxK() + links);
        if (s.resamplesFeatures()) {
            perReplicate += 8L * m * p;
        }
        int inFlight = Math.max(1, threads);
        long replicates = inFlight * perReplicate;
        long nulls = 0;
        if (hasData && s.nullSets() > 0) {
            // one null set at a time with its replicates in parallel; sets run side by side only when
            // their memory fits (see nullSetBytes)
            nulls = data + distances + links * ConsensusAccumulator.bytesFor(n, s.maxK(), s.nullReplicates())
                    + inFlight * perReplicate;
        }
        long gap = 0;
        if (hasData && s.referenceSets() > 0) {
            gap = inFlight * (data + 2 * distances);
        }
        long multiscale = 0;
        if (hasData && s.branchPValues() != null) {
            // per running replicate: distances over all samples, the linkage's working copy, the drawn columns
            double largest = s.branchPValues().scales().stream().mapToDouble(Double::doubleValue).max().orElse(1);
            multiscale = inFlight * (2 * distances + 8L * n * Math.max(1, Math.round(largest * p)) + 64L * n * links);
        }
        long peak = replicates;
        String phase = "stability replicates";
        if (multiscale > peak) {
            peak = multiscale;
            phase = "multiscale bootstrap (branch p-values)";
        }
        if (nulls > peak) {
            peak = nulls;
            phase = "null calibration";
        }
        if (gap > peak) {
            peak = gap;
            phase = "gap statistic";
        }
        return new MemoryEstimate(persistent, peak, phase);
    }

    /**
     * The bytes one null data set holds while it runs as a task of its own on one thread (its data, distances,
     * consensus counters and one replicate at a time): what each more null set run side by side adds.
     */
    public static long nullSetBytes(int n, int p, StudySettings s) {
        int m = s.resampling() == org.treeproof.resample.Resampling.SUBSAMPLE
                ? (int) Math.round(s.sampleFraction() * n) : n;
        long perReplicate = 2 * CondensedDistances.bytesFor(m) + 64L * m * (s.maxK() + s.linkages().size());
        if (s.resamplesFeatures()) {
            perReplicate += 8L * m * p;
        }
        return 8L * n * p + CondensedDistances.bytesFor(n)
                + s.linkages().size() * ConsensusAccumulator.bytesFor(n, s.maxK(), s.nullReplicates()) + perReplicate;
    }

    /**
     * Whether {@code sets} null data sets fit side by side in {@code heapBytes} next to what the study holds for
     * the whole run, with the headroom {@link #requireFits} keeps.
     */
    public boolean nullSetsFitSideBySide(int sets, long setBytes, long heapBytes) {
        long needed = persistent + sets * setBytes;
        return needed + needed / 10 + (64L << 20) <= heapBytes;
    }

    public long total() {
        return persistent + peakPhase;
    }

    /**
     * Fails with advice when the estimate (plus a tenth and 64 MiB for the JVM's own needs and fragmentation) exceeds
     * {@code heapBytes}.
     */
    public void requireFits(long heapBytes, int n) {
        long needed = total() + total() / 10 + (64L << 20);
        if (needed > heapBytes) {
            // the parts are rounded in one unit and the headroom takes the remainder, so the figures add up exactly
            boolean inGib = needed >= (1L << 30);
            double unit = inGib ? (1L << 30) / 10.0 : (1L << 20);
            long all = Math.round(needed / unit);
            long kept = Math.round(persistent / unit);
            long during = Math.round(peakPhase / unit);
            long headroom = all - kept - during;
            throw new NotEnoughMemoryException(String.format(Locale.ROOT,
                    "this study needs about %s of memory (%s for the data, distances and consensus counters, %s more "
                            + "during %s, %s of headroom for Java itself) but Java may use only %s; give Java more "
                            + "heap (java -Xmx%dg -jar ...), run fewer --threads, assess fewer samples, reduce features "
                            + "with --top-variable, or lower --null-sets/--reference-sets",
                    shown(all, inGib), shown(kept, inGib), shown(during, inGib), phase, shown(headroom, inGib),
                    gib(heapBytes), (long) Math.ceil(needed / (double) (1L << 30)) + 1));
        }
    }

    private static String shown(long units, boolean inGib) {
        return inGib ? String.format(Locale.ROOT, "%d.%d GiB", units / 10, units % 10) : units + " MiB";
    }

    private static String gib(long bytes) {
        return bytes >= (1L << 30) ? String.format(Locale.ROOT, "%.1f GiB", bytes / (double) (1L << 30))
                : String.format(Locale.ROOT, "%.0f MiB", bytes / (double) (1L << 20));
    }
}
