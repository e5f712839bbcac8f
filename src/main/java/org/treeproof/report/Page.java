package org.treeproof.report;

import java.util.Map;

/**
 * The working state of one HTML rendering: the writer, the embedded images by figure id, the running figure
 * number, and whether the table being written has shown a dash for a missing value (so its footnote is added).
 */
final class Page {
    final Html html = new Html();
    private final Map<String, EmbeddedImage> images;
    private final Map<String, String> chartNotes;
    private int figureNumber;
    private boolean missingInTable;

    Page(Map<String, EmbeddedImage> images) {
        this(images, Map.of());
    }

    Page(Map<String, EmbeddedImage> images, Map<String, String> chartNotes) {
        this.images = images;
        this.chartNotes = chartNotes;
    }

    /** A numeric cell; notes when it shows the dash for a missing value. */
    Page num(String formatted) {
        if (formatted.contains(Numbers.MISSING)) {
            missingInTable = true;
        }
        html.element("td", "num", formatted);
        return this;
    }

    Page cell(String text) {
        html.element("td", text);
        return this;
    }

    /** Opens a table with a caption and a header row; numeric columns are those whose label starts with '#'. */
    Page table(String cls, String caption, String... headers) {
        missingInTable = false;
        html.open("div", "class", "scroll").open("table", "class", cls);
        if (caption != null) {
            html.element("caption", caption);
        }
        html.open("thead").open("tr");
        for (String h : headers) {
            if (h.startsWith("#")) {
                html.open("th", "class", "num", "scope", "col").text(h.substring(1)).close("th");
            } else {
                html.open("th", "scope", "col").text(h).close("th");
            }
        }
        html.close("tr").close("thead").open("tbody");
        return this;
    }

    /** Closes the table and adds the dash's footnote if the table used it. */
    Page endTable() {
        html.close("tbody").close("table").close("div").newline();
        if (missingInTable) {
            html.element("p", "footnote", Numbers.MISSING + " not available: not computed in this study (null "
                    + "calibration, the gap statistic or the feature-space indices were not run) or not defined here "
                    + "(a linkage without a convincing solution has no figures of its own).");
        }
        missingInTable = false;
        return this;
    }

    /** Writes a figure: the embedded image when one was given, otherwise where the chart file is. */
    void figure(Figure f) {
        figureNumber++;
        EmbeddedImage img = images.get(f.id());
        html.open("figure", "id", "figure-" + f.id(), "class", img == null ? "absent" : null);
        if (img != null) {
            html.open("img", "src", img.dataUri(), "alt", f.title());
        }
        html.open("figcaption").element("strong", "Figure " + figureNumber + ". " + f.title() + ". ").text(f.caption());
        String note = chartNotes.getOrDefault(f.id(), "").strip();
        if (img != null && !note.isEmpty()) {
            html.text(" Note: " + note + ".");
        } else if (img == null) {
            html.text(note.isEmpty() ? " (Chart not embedded; see " + f.path() + ".)" : " (Not drawn: " + note + ".)");
        }
        html.close("figcaption").close("figure").newline();
    }
}
