package org.treeproof.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class RunInfoTest {
    private static final String SHA = "0123456789abcdef".repeat(4);

    private static RunInfo run(String sha, int threads, double wall, List<String> prep) {
        return new RunInfo("treeproof", "0.1.0", "in.csv", sha, 10, 3, prep, "euclidean", "treeproof assess in.csv", 1,
                threads, wall, "2024-01-01T00:00:00Z");
    }

    @Test
    void hashIsSixtyFourHexDigitsKeptInLowerCase() {
        assertEquals(SHA, run(SHA.toUpperCase(java.util.Locale.ROOT), 1, 0, List.of()).inputSha256());
        assertThrows(IllegalArgumentException.class, () -> run(SHA.substring(1), 1, 0, List.of()));
        assertThrows(IllegalArgumentException.class, () -> run(SHA.substring(1) + "g", 1, 0, List.of()));
    }

    @Test
    void threadsAndWallTimeMustBeSensible() {
        assertThrows(IllegalArgumentException.class, () -> run(SHA, 0, 1, List.of()));
        assertThrows(IllegalArgumentException.class, () -> run(SHA, 1, -1, List.of()));
        assertThrows(IllegalArgumentException.class, () -> run(SHA, 1, Double.NaN, List.of()));
        assertThrows(IllegalArgumentException.class, () -> run(SHA, 1, Double.POSITIVE_INFINITY, List.of()));
    }

    @Test
    void preparationStepsAreCopied() {
        var steps = new ArrayList<>(List.of("log2(x+1) applied"));
        RunInfo r = run(SHA, 1, 1, steps);
        steps.add("later");
        assertEquals(List.of("log2(x+1) applied"), r.preparation());
    }
}
