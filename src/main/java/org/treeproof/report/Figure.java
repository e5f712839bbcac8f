package org.treeproof.report;

import java.util.List;
import java.util.Objects;

/**
 * One chart the report shows. The report model fixes which figures there are, in which order, and what they
 * say; the chart package draws them to {@link #path()} and the HTML renderer embeds what it is given.
 *
 * @param id       one of {@link #IDS}
 * @param title    a short title
 * @param caption  what the chart shows, with its units, in one or two sentences
 * @param fileName the file's name inside {@link #DIRECTORY} ({@code id + ".png"})
 */
public record Figure(String id, String title, String caption, String fileName) {
    /** The figure ids, in the order the report shows them. */
    public static final List<String> IDS = List.of("dendrogram", "silhouette", "stability", "gap", "consensus",
            "jaccard", "linkages", "heatmap", "features", "sensitivity");

    /** The directory of the output that holds the charts. */
    public static final String DIRECTORY = "charts";

    public Figure {
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(caption, "caption");
        Objects.requireNonNull(fileName, "fileName");
        if (!IDS.contains(id)) {
            throw new IllegalArgumentException("unknown figure id '" + id + "'; known: " + IDS);
        }
    }

    /** The chart's path relative to the output directory, with '/' as separator. */
    public String path() {
        return DIRECTORY + "/" + fileName;
    }
}
