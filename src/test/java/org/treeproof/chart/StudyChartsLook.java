package org.treeproof.chart;

import java.nio.file.Path;
import java.util.List;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.MissingPolicy;
import org.treeproof.data.Preparation;
import org.treeproof.data.Scale;
import org.treeproof.io.DataTableReader;
import org.treeproof.study.StudySettings;

/**
 * Runs real studies and draws all their figures, for looking at by eye:
 * {@code java ... org.treeproof.chart.StudyChartsLook [outDir] [repoDir]}. Not a test. Writes the bundled
 * demo data (log2, z-scored) with null calibration that can and cannot reach p = 0.05, and a 2000-sample
 * synthetic table with more features than the heat map shows.
 */
public final class StudyChartsLook {
    private StudyChartsLook() {
    }

    public static void main(String[] args) throws Exception {
        Path out = Path.of(args.length > 0 ? args[0] : "/tmp/study-charts-look");
        Path repo = Path.of(args.length > 1 ? args[1] : ".");
        DataMatrix raw = DataTableReader.byFileName().read(repo.resolve("demo-data/yeast-batches.csv")).matrix();
        DataMatrix demo = new Preparation(MissingPolicy.ERROR, true, Scale.ZSCORE, 0).apply(raw).matrix();
        draw(out.resolve("demo-null5"), StudyFixtures.run(demo, StudySettings.builder().replicates(50).nullSets(5)
                .nullReplicates(10).referenceSets(10).build()));
        draw(out.resolve("demo-null19"), StudyFixtures.run(demo, StudySettings.builder().replicates(50).nullSets(19)
                .nullReplicates(10).referenceSets(10).build()));
        DataMatrix big = StudyFixtures.groups(new int[] {700, 500, 400, 250, 150}, 520, 20, 2.5, 2000);
        draw(out.resolve("synthetic-2000"), StudyFixtures.run(big, StudySettings.builder().replicates(30).nullSets(19)
                .nullReplicates(4).referenceSets(5).maxK(8).build()));
    }

    private static void draw(Path dir, StudyFixtures.Run run) throws Exception {
        long t0 = System.nanoTime();
        List<Figure> figures = StudyCharts.drawAll(run.evidence(), run.recommendation(), run.data(), dir, 2);
        System.out.printf("%s: %s k=%d %s, charts in %.1f s%n", dir, run.recommendation().linkage().id(),
                run.recommendation().k(), run.recommendation().verdict().id(), (System.nanoTime() - t0) / 1e9);
        for (Figure f : figures) {
            System.out.println("  " + f);
        }
    }
}
