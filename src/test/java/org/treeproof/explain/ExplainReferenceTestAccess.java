package org.treeproof.explain;

import java.util.ArrayList;

/** Expands a clusters × categories table into per-sample labels and categories. */
final class ExplainReferenceTestAccess {
    private ExplainReferenceTestAccess() {
    }

    static Solution rows(int[][] table) {
        var labels = new ArrayList<Integer>();
        for (int r = 0; r < table.length; r++) {
            for (int c = 0; c < table[r].length; c++) {
                for (int x = 0; x < table[r][c]; x++) {
                    labels.add(r + 1);
                }
            }
        }
        return Solution.of(labels.stream().mapToInt(Integer::intValue).toArray());
    }

    static String[] columns(int[][] table) {
        var cats = new ArrayList<String>();
        for (int[] row : table) {
            for (int c = 0; c < row.length; c++) {
                for (int x = 0; x < row[c]; x++) {
                    cats.add("level" + c);
                }
            }
        }
        return cats.toArray(String[]::new);
    }
}
