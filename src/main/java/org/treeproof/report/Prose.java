package org.treeproof.report;

import static org.treeproof.report.ModelFactory.f;

import java.util.List;

/** Phrases both renderers use, so the Markdown and the HTML say the same thing in the same words. */
final class Prose {
    private Prose() {
    }

    /** Where the tree is cut, as a clause: the height, and the heights that give the same clusters. */
    static String cut(EvidenceRow r, EvidenceTable t) {
        String chosen = Numbers.scaled(r.cutHeight().chosen());
        if (!t.monotone()) {
            return f("the state after the first n − %d merges; the tree has inversions, so a cut by height need not "
                    + "give these clusters; reported height %s", r.k(), chosen);
        }
        if (r.tieDependent() || !(r.cutHeight().low() < r.cutHeight().high())) {
            return f("tree cut at height %s, where merge heights tie, so which %d clusters result depends on the "
                    + "order of the tied merges", chosen, r.k());
        }
        return f("tree cut at height %s; every height from %s up to %s gives the same clusters", chosen,
                Numbers.scaled(r.cutHeight().low()), Numbers.scaled(r.cutHeight().high()));
    }

    /** "a", "a and b", "a, b and c". */
    static String and(List<String> items) {
        return joined(items, " and ");
    }

    /** "a", "a or b", "a, b or c". */
    static String or(List<String> items) {
        return joined(items, " or ");
    }

    private static String joined(List<String> items, String last) {
        if (items.size() <= 1) {
            return String.join("", items);
        }
        return String.join(", ", items.subList(0, items.size() - 1)) + last + items.get(items.size() - 1);
    }
}
