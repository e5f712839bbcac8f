package org.treeproof.resample;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class LocalExecutorTest {

    @Test
    void deliversResultsInIndexOrderWhateverTheCompletionOrder() {
        for (int threads : new int[] {1, 2, 3, 8}) {
            List<Integer> seen = new ArrayList<>();
            new LocalExecutor(threads).run(3, 60, i -> {
                // uneven work so that later indices often finish first
                long spin = new SplittableRandom(i).nextInt(200_000);
                double x = 0;
                for (long s = 0; s < spin; s++) {
                    x += Math.sqrt(s);
                }
                return x >= 0 ? i : -1;
            }, seen::add);
            List<Integer> expected = new ArrayList<>();
            for (int i = 3; i < 60; i++) {
                expected.add(i);
            }
            assertEquals(expected, seen, "threads " + threads);
        }
    }

    @Test
    void aFailingTaskFailsTheRunWithItsOwnException() {
        var ex = assertThrows(IllegalArgumentException.class, () -> new LocalExecutor(2).run(0, 10, i -> {
            if (i == 4) {
                throw new IllegalArgumentException("task 4");
            }
            return i;
        }, r -> { }));
        assertEquals("task 4", ex.getMessage());
    }
}
