package org.treeproof.demo;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;

/**
 * The seeded generator of the bundled demo tables (an invented scenario, described in demo-data/README.md).
 *
 * <p>A fictional cooperative brewery keeps an aroma profile of every fermentation batch: peak areas of
 * 48 aroma compounds measured by gas chromatography, one row per batch. Peak areas are positive and
 * right-skewed, so the tables are analysed after {@code --log2}. Every batch also carries a continuous
 * "vigour" effect (how hot and fast it fermented) that moves eight ester compounds together; it is
 * structure without clusters, there to make the structureless table realistic rather than pure noise.
 *
 * <ul>
 *   <li>{@code yeast-batches.csv}: 180 batches from three house yeast strains (70, 60, 50 batches); each
 *       strain raises or lowers its own set of 12 compounds by 4.0 log2 units (so the three are equally far apart).</li>
 *   <li>{@code single-strain-batches.csv}: 150 batches of one strain: vigour and noise only.</li>
 *   <li>{@code nested-strains.csv}: 160 batches from two yeast families that each hold two strains
 *       (40 batches each): families differ by 6.0 log2 units on 16 compounds, strains within a family
 *       by 3.2 log2 units on 8 others.</li>
 * </ul>
 * The planted group of each batch is written to a separate {@code *-truth.csv} so it can be given to
 * {@code --labels}. Everything is drawn from {@link SplittableRandom} with fixed seeds, so the files
 * are the same on every machine; a test checks the committed files equal this generator's output.
 */
public final class DemoDataGenerator {
    static final int COMPOUNDS = 48;
    private static final double NOISE_SD = 0.45;

    /** One generated table: its CSV text and the CSV text of the planted groups. */
    public record Table(String fileName, String csv, String truthFileName, String truthCsv) {
    }

    private DemoDataGenerator() {
    }

    /** All demo tables, in a fixed order. */
    public static List<Table> tables() {
        return List.of(planted(), structureless(), nested());
    }

    static Table planted() {
        var rng = new SplittableRandom(20261201L);
        double[] base = baseline(rng);
        int[] sizes = {70, 60, 50};
        String[] strains = {"strain-A", "strain-B", "strain-C"};
        double[][] shifts = new double[3][COMPOUNDS];
        for (int g = 0; g < 3; g++) {
            // strain g marks compounds 8+12g .. 8+12g+9, sign alternating, magnitude 2.0..3.0 log2 units
            for (int c = 0; c < 12; c++) {
                double magnitude = 4.0;
                shifts[g][8 + 13 * g + c] = (c % 2 == 0 ? 1 : -1) * magnitude;
            }
        }
        return build("yeast-batches.csv", "batch", rng, base, sizes, strains, shifts);
    }

    static Table structureless() {
        var rng = new SplittableRandom(20261202L);
        double[] base = baseline(rng);
        return build("single-strain-batches.csv", "lot", rng, base, new int[] {150}, new String[] {"strain-A"},
                new double[1][COMPOUNDS]);
    }

    static Table nested() {
        var rng = new SplittableRandom(20261203L);
        double[] base = baseline(rng);
        int[] sizes = {40, 40, 40, 40};
        String[] strains = {"family-1/strain-a", "family-1/strain-b", "family-2/strain-c", "family-2/strain-d"};
        double[][] shifts = new double[4][COMPOUNDS];
        for (int g = 0; g < 4; g++) {
            int family = g / 2;
            for (int c = 8; c < 24; c++) {
                shifts[g][c] += (family == 0 ? 3.0 : -3.0) * (c % 2 == 0 ? 1 : -1);
            }
            int first = 24 + 12 * family;
            for (int c = first; c < first + 8; c++) {
                shifts[g][c] += (g % 2 == 0 ? 1.6 : -1.6) * (c % 2 == 0 ? 1 : -1);
            }
        }
        return build("nested-strains.csv", "run", rng, base, sizes, strains, shifts);
    }

    /** Per-compound baseline log2 peak areas between 6 and 14 (areas of about 64 to 16 000). */
    private static double[] baseline(SplittableRandom rng) {
        double[] b = new double[COMPOUNDS];
        for (int c = 0; c < COMPOUNDS; c++) {
            b[c] = 6 + 8 * rng.nextDouble();
        }
        return b;
    }

    private static Table build(String file, String idPrefix, SplittableRandom rng, double[] base, int[] sizes,
            String[] groups, double[][] shifts) {
        int n = 0;
        for (int s : sizes) {
            n += s;
        }
        // Shuffle the order of batches so that groups are not contiguous in the file.
        int[] groupOf = new int[n];
        for (int g = 0, i = 0; g < sizes.length; g++) {
            for (int r = 0; r < sizes[g]; r++) {
                groupOf[i++] = g;
            }
        }
        for (int i = n - 1; i > 0; i--) {
            int j = rng.nextInt(i + 1);
            int t = groupOf[i];
            groupOf[i] = groupOf[j];
            groupOf[j] = t;
        }
        var csv = new StringBuilder("batch");
        for (int c = 0; c < COMPOUNDS; c++) {
            csv.append(',').append(compoundName(c));
        }
        csv.append('\n');
        var truth = new StringBuilder("batch,planted_group\n");
        for (int i = 0; i < n; i++) {
            String id = String.format(Locale.ROOT, "%s-%03d", idPrefix, i + 1);
            double vigour = gaussian(rng);
            csv.append(id);
            for (int c = 0; c < COMPOUNDS; c++) {
                double log2Area = base[c] + shifts[groupOf[i]][c] + (c < 8 ? 0.8 * vigour : 0)
                        + NOISE_SD * gaussian(rng);
                double area = Math.pow(2, log2Area) - 1;
                csv.append(',').append(String.format(Locale.ROOT, "%.1f", Math.max(0, area)));
            }
            csv.append('\n');
            truth.append(id).append(',').append(groups[groupOf[i]]).append('\n');
        }
        return new Table(file, csv.toString(), file.replace(".csv", "-truth.csv"), truth.toString());
    }

    private static final String[] COMPOUND_STEMS = {
        "ethyl-acetate", "isoamyl-acetate", "ethyl-hexanoate", "ethyl-octanoate", "phenylethyl-acetate",
        "ethyl-decanoate", "isobutyl-acetate", "hexyl-acetate", "isoamyl-alcohol", "phenylethanol",
        "isobutanol", "propanol", "acetaldehyde", "diacetyl", "pentanedione", "dimethyl-sulfide",
        "linalool", "geraniol", "citronellol", "myrcene", "humulene", "caryophyllene", "4-vinylguaiacol",
        "eugenol", "hexanoic-acid", "octanoic-acid", "decanoic-acid", "acetic-acid", "methionol",
        "furfural", "ethyl-lactate", "ethyl-butanoate", "methyl-butanol", "nerol", "terpineol",
        "beta-damascenone", "ethyl-cinnamate", "isovaleric-acid", "butyric-acid", "benzaldehyde",
        "ethyl-propanoate", "propyl-acetate", "butyl-acetate", "heptanol", "octanol", "nonanal",
        "decanal", "guaiacol"};

    static String compoundName(int c) {
        return COMPOUND_STEMS[c];
    }

    /** A standard normal draw by the Marsaglia polar method (Marsaglia & Bray 1964, SIAM Rev. 6:260). */
    private static double gaussian(SplittableRandom rng) {
        double u;
        double v;
        double s;
        do {
            u = 2 * rng.nextDouble() - 1;
            v = 2 * rng.nextDouble() - 1;
            s = u * u + v * v;
        } while (s >= 1 || s == 0);
        return u * Math.sqrt(-2 * Math.log(s) / s);
    }
}
