package org.treeproof.resample;

import java.io.Serializable;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;

/**
 * The plans of a multiscale bootstrap of features: at scale {@code r} a replicate draws {@code round(r·p)} of the
 * {@code p} features with replacement (at least one), so {@code r} may exceed 1. Replicates are numbered scale by
 * scale: index {@code s·B + b} is replicate {@code b} of scale {@code s}. Its draws come from
 * {@code Seeds.child(Seeds.seedFor(master, MULTISCALE, s), b)}: seeded per (scale, replicate), a pure function of
 * the index, and independent of how many replicates the other scales have.
 *
 * <p>H. Shimodaira, Systematic Biology 51 (2002) 492-508, doi:10.1080/10635150290069913, describes the scheme for
 * sites of an alignment; R. Suzuki and H. Shimodaira, Bioinformatics 22 (2006) 1540-1542,
 * doi:10.1093/bioinformatics/btl117, for the features of a clustering.
 *
 * @param features           p, the number of features of the data
 * @param scales             the scales r, positive
 * @param replicatesPerScale B, replicates per scale
 * @param masterSeed         the study's seed
 */
public record MultiscalePlanner(int features, List<Double> scales, int replicatesPerScale, long masterSeed)
        implements Serializable {

    public MultiscalePlanner {
        scales = List.copyOf(scales);
        if (features < 1) {
            throw new IllegalArgumentException("the multiscale bootstrap needs features");
        }
        if (scales.isEmpty() || replicatesPerScale < 1) {
            throw new IllegalArgumentException("need scales and replicates");
        }
        for (double r : scales) {
            if (!(r > 0) || Double.isInfinite(r)) {
                throw new IllegalArgumentException("scale not positive: " + r);
            }
        }
    }

    /** All replicates of all scales. */
    public int replicates() {
        return scales.size() * replicatesPerScale;
    }

    /** The scale index of replicate {@code index}. */
    public int scaleOf(int index) {
        return index / replicatesPerScale;
    }

    /** The features drawn at scale {@code s}: {@code max(1, round(r·p))}. */
    public int drawsAt(int s) {
        return (int) Math.max(1, Math.round(scales.get(s) * features));
    }

    /** The scale actually realised at scale {@code s}, {@code drawsAt(s) / p} (rounding included). */
    public double realisedScale(int s) {
        return (double) drawsAt(s) / features;
    }

    /** The features (column indices, sorted, with repeats) replicate {@code index} draws. */
    public int[] plan(int index) {
        if (index < 0 || index >= replicates()) {
            throw new IndexOutOfBoundsException("replicate " + index + " of " + replicates());
        }
        int s = scaleOf(index);
        int b = index % replicatesPerScale;
        var rng = new SplittableRandom(Seeds.child(Seeds.seedFor(masterSeed, Seeds.Purpose.MULTISCALE, s), b));
        int[] drawn = new int[drawsAt(s)];
        for (int i = 0; i < drawn.length; i++) {
            drawn[i] = rng.nextInt(features);
        }
        Arrays.sort(drawn);
        return drawn;
    }
}
