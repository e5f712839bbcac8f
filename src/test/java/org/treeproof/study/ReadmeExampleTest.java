package org.treeproof.study;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.treeproof.data.DataMatrix;
import org.treeproof.data.MissingPolicy;
import org.treeproof.data.Preparation;
import org.treeproof.data.Scale;
import org.treeproof.io.DataTable;
import org.treeproof.io.DataTableReader;
import org.treeproof.resample.LocalExecutor;
import org.treeproof.tree.Linkage;

/** The README's "From Java" example, kept compiling and true (on the planted demo table, fewer replicates). */
class ReadmeExampleTest {

    @Test
    void theReadmeExampleRunsAndFindsThePlantedStrains() {
        DataTable table = DataTableReader.byFileName().read(Path.of("demo-data/yeast-batches.csv"));
        DataMatrix data = new Preparation(MissingPolicy.ERROR, true, Scale.ZSCORE, 0).apply(table.matrix()).matrix();
        StudySettings settings = StudySettings.builder()
                .linkages(List.of(Linkage.AVERAGE, Linkage.WARD)).replicates(40).nullReplicates(5).referenceSets(10)
                .seed(42).build();
        Evidence evidence = new StudyRunner(StudyInput.of(data), settings, new LocalExecutor(2), 2,
                StudyProgress.SILENT).run();
        Recommendation rec = Recommender.of(evidence, DecisionRule.DEFAULT).recommend();
        assertEquals(Verdict.SUPPORTED, rec.verdict());
        assertEquals(3, rec.k());
    }
}
