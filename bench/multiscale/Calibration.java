import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.treeproof.data.DataMatrix;
import org.treeproof.resample.LocalExecutor;
import org.treeproof.score.MultiscaleFit;
import org.treeproof.study.BranchPValueSettings;
import org.treeproof.study.BranchPValues;
import org.treeproof.study.Evidence;
import org.treeproof.study.LinkageEvidence;
import org.treeproof.study.StudyInput;
import org.treeproof.study.StudyProgress;
import org.treeproof.study.StudyRunner;
import org.treeproof.study.StudySettings;
import org.treeproof.tree.Linkage;

/**
 * Calibration of AU p-values on data without groups: SETS tables of N samples by P features, every value an
 * independent standard normal (seeded), each studied with --branch-pvalues (default scales, B replicates per
 * scale) under average, complete and Ward linkage. Prints the histogram of au over every fitted branch except
 * the root, the share at or above 0.95, and how the other branches ended.
 *
 * Run (from the repository root, after mvn -q -DskipTests package):
 *   java -cp target/treeproof.jar bench/multiscale/Calibration.java [SETS N P B]
 */
public class Calibration {
    public static void main(String[] args) {
        int sets = args.length > 0 ? Integer.parseInt(args[0]) : 20;
        int n = args.length > 1 ? Integer.parseInt(args[1]) : 30;
        int p = args.length > 2 ? Integer.parseInt(args[2]) : 50;
        int b = args.length > 3 ? Integer.parseInt(args[3]) : 200;
        int[] bins = new int[20];
        int fitted = 0;
        int high = 0;
        var status = new java.util.EnumMap<MultiscaleFit.Status, Integer>(MultiscaleFit.Status.class);
        long start = System.nanoTime();
        for (int set = 0; set < sets; set++) {
            DataMatrix data = noise(n, p, 1000 + set);
            StudySettings s = StudySettings.builder().linkages(List.of(Linkage.AVERAGE, Linkage.COMPLETE, Linkage.WARD))
                    .maxK(3).replicates(2).referenceSets(0).nullSets(0).seed(set + 1)
                    .branchPValues(new BranchPValueSettings(BranchPValueSettings.DEFAULT_SCALES, b)).build();
            Evidence e = new StudyRunner(StudyInput.of(data), s, new LocalExecutor(2), 2, StudyProgress.SILENT).run();
            for (LinkageEvidence le : e.linkages()) {
                BranchPValues pv = le.branchPValues();
                for (int m = 0; m < n - 2; m++) { // the root (merge n-2) holds every sample and always reappears
                    MultiscaleFit.Result r = pv.at(m);
                    status.merge(r.status(), 1, Integer::sum);
                    if (r.fitted()) {
                        fitted++;
                        bins[Math.min(19, (int) (r.au() * 20))]++;
                        if (r.au() >= 0.95) {
                            high++;
                        }
                    }
                }
            }
        }
        System.out.printf("data without groups: %d sets of %d x %d standard normal values; average, complete and ward;"
                + " %d replicates at each of 10 scales (%.0f s)%n", sets, n, p, b, (System.nanoTime() - start) / 1e9);
        System.out.println("branches by outcome (root left out): " + status);
        System.out.printf("fitted branches: %d; au >= 0.95: %d (%.1f%%)%n", fitted, high, 100.0 * high / fitted);
        int max = java.util.Arrays.stream(bins).max().orElse(1);
        for (int i = 0; i < 20; i++) {
            System.out.printf("[%.2f, %.2f%s %5d %s%n", i / 20.0, (i + 1) / 20.0, i == 19 ? "]" : ")", bins[i],
                    "#".repeat((int) Math.round(50.0 * bins[i] / max)));
        }
    }

    static DataMatrix noise(int n, int p, long seed) {
        var rng = new SplittableRandom(seed);
        double[] v = new double[n * p];
        for (int i = 0; i < v.length; i++) {
            v[i] = gaussian(rng);
        }
        var ids = new ArrayList<String>();
        for (int i = 0; i < n; i++) {
            ids.add("s" + i);
        }
        var names = new ArrayList<String>();
        for (int j = 0; j < p; j++) {
            names.add("f" + j);
        }
        return new DataMatrix(ids, names, v);
    }

    static double gaussian(SplittableRandom rng) {
        double u;
        double w;
        double s;
        do {
            u = 2 * rng.nextDouble() - 1;
            w = 2 * rng.nextDouble() - 1;
            s = u * u + w * w;
        } while (s >= 1 || s == 0);
        return u * Math.sqrt(-2 * Math.log(s) / s);
    }
}
