package org.treeproof.report;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;

/**
 * The evidence tables fit narrower pages: their number cells may wrap, and only at one chosen point, so that a
 * figure stays on one line and its interval, range end or s_k moves to a second line. (The layout itself was checked
 * by hand in headless Chromium at 1280 and 800 px and in print; see RELIABILITY.md.)
 */
class WideTableTest {
    @Test
    void evidenceCellsWrapOnlyBetweenAFigureAndItsInterval() {
        Studies.Study s = Studies.bridged();
        ReportModel m = s.model();
        Document d = Jsoup.parse(HtmlReport.of(m, List.of()).render());
        String css = d.select("style").html();
        assertTrue(css.contains("table.evidence td.num { white-space: normal; }"), "evidence cells may wrap");
        var cells = d.select("table.evidence td.num");
        assertFalse(cells.isEmpty());
        int wrappable = 0;
        for (Element c : cells) {
            String text = c.wholeText();
            long spaces = text.chars().filter(ch -> ch == ' ').count();
            assertTrue(spaces <= 1, () -> "at most one break point in '" + text + "'");
            if (spaces == 1) {
                wrappable++;
                String[] parts = text.split(" ");
                assertTrue(parts[1].startsWith("[") || parts[1].startsWith("±") || parts[0].endsWith("\u00A0to"),
                        () -> "breaks before the interval, the ± or after 'to': '" + text + "'");
            }
        }
        assertTrue(wrappable > 0, "intervals, ranges and gap ± s_k can wrap");
    }
}
