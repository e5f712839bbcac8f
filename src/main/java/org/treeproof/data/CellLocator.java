package org.treeproof.data;

/**
 * Says where a cell of a matrix came from, so that a message about a value can name its file, line and column.
 *
 * <p>A reader of files supplies one that knows every cell's line and column; a matrix made in memory uses
 * {@link #unplaced(String)}, whose locations are just a name. Locations are looked up by sample id and feature
 * name rather than by index, so they stay right after samples or features have been dropped.
 */
public interface CellLocator {

    /** The name of the source as messages should show it, for example the path the user gave. */
    String source();

    /**
     * The location of a cell, for example {@code data.csv:7:3} (1-based line and column, the header is line 1),
     * or {@link #source()} when the position is not known.
     */
    String locate(String sampleId, String featureName);

    /**
     * Whether the source lists its values feature by feature (one feature per line, a feature-by-sample file),
     * so that "the first cell in reading order" is found column by column in the matrix.
     */
    boolean featureMajor();

    /** A locator that knows no positions: every location is {@code name}, and the reading order is by sample. */
    static CellLocator unplaced(String name) {
        if (name == null || name.isEmpty()) {
            throw new IllegalArgumentException("a source needs a name");
        }
        return new CellLocator() {
            @Override
            public String source() {
                return name;
            }

            @Override
            public String locate(String sampleId, String featureName) {
                return name;
            }

            @Override
            public boolean featureMajor() {
                return false;
            }
        };
    }
}
