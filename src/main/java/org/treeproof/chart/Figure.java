package org.treeproof.chart;

import java.util.List;
import java.util.Objects;

/**
 * One figure of a study as {@link StudyCharts#drawAll} left it: drawn, or skipped with the reason.
 *
 * @param id     the fixed id the report embeds it by, e.g. {@code "dendrogram"}; also the files' base name
 * @param title  the chart's title in plain words (also for a skipped figure: what it would have shown)
 * @param files  the written files, relative to the charts directory, PNG first ({@code id.png}, then
 *               {@code id.svg} where a vector copy was written); empty when the figure was skipped
 * @param width  the PNG's width in pixels, 0 when skipped
 * @param height the PNG's height in pixels, 0 when skipped
 * @param note   why the figure was skipped, or a caveat the reader of a drawn figure needs; empty when there
 *               is nothing to add, never null
 */
public record Figure(String id, String title, List<String> files, int width, int height, String note) {

    public Figure {
        Check.text(id, "id");
        Check.text(title, "title");
        files = List.copyOf(files);
        Objects.requireNonNull(note, "note");
        if (files.isEmpty() ? (width != 0 || height != 0 || note.isBlank()) : (width < 1 || height < 1)) {
            throw new IllegalArgumentException(id + ": a drawn figure has a size, a skipped one has size 0 and a"
                    + " note saying why");
        }
    }

    /** Whether files were written. */
    public boolean drawn() {
        return !files.isEmpty();
    }
}
