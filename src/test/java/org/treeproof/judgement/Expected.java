package org.treeproof.judgement;

import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;

/**
 * The answers accepted for one case, with the reason they are right. A case is judged right when the study's
 * recommendation matches at least one accepted answer.
 *
 * @param answers the accepted answers (at least one)
 * @param reason  why these and only these answers are right, in a sentence or two
 */
public record Expected(List<Answer> answers, String reason) {
    /**
     * The smallest number of samples a recommended cluster may hold in any case: the hard requirement that a split of
     * 1-3 samples is never called the answer. This is the suite's own judgement, not the tool's minimum cluster size.
     */
    public static final int SMALLEST_CLUSTER = 4;

    public Expected {
        answers = List.copyOf(answers);
        if (answers.isEmpty()) {
            throw new IllegalArgumentException("no accepted answer");
        }
    }

    /** One accepted answer. */
    public sealed interface Answer permits NoStructure, Structure {
        /** Short text for the table, e.g. {@code none} or {@code k=3 S}. */
        String label();
    }

    /** No cluster structure: the recommendation is k = 1 (whatever the verdict's name), outliers allowed. */
    public record NoStructure() implements Answer {
        @Override
        public String label() {
            return "none";
        }
    }

    /**
     * Cluster structure with one of {@code ks} clusters and one of {@code verdicts}.
     *
     * @param ks             accepted numbers of clusters (outliers set aside do not count)
     * @param verdicts       accepted verdict names
     * @param minSmallest    every recommended cluster has at least this many samples (at least
     *                       {@link #SMALLEST_CLUSTER})
     * @param minAri         the adjusted Rand index of the recommended clusters with the truth must reach this
     *                       (NaN: not checked)
     * @param farPointsAside every planted far point must be set aside as an outlier, not put in a cluster
     */
    public record Structure(Set<Integer> ks, Set<String> verdicts, int minSmallest, double minAri,
            boolean farPointsAside) implements Answer {
        public Structure {
            ks = Set.copyOf(ks);
            verdicts = Set.copyOf(verdicts);
            minSmallest = Math.max(minSmallest, SMALLEST_CLUSTER);
        }

        @Override
        public String label() {
            var sorted = new TreeSet<>(ks);
            String k = sorted.last() - sorted.first() + 1 == ks.size() && ks.size() > 2
                    ? sorted.first() + ".." + sorted.last()
                    : sorted.stream().map(String::valueOf).collect(Collectors.joining(","));
            var s = new StringBuilder("k=").append(ks.size() == 1 ? k : "{" + k + "}");
            s.append(verdicts.size() == 1 ? " " + verdicts.iterator().next().charAt(0) : " s/t");
            if (minSmallest > SMALLEST_CLUSTER) {
                s.append(" min").append(minSmallest);
            }
            if (!Double.isNaN(minAri)) {
                s.append(" ari>=").append(minAri);
            }
            if (farPointsAside) {
                s.append(" +out");
            }
            return s.toString();
        }
    }

    /** The verdict names of the current contract (summary.json {@code recommendation.verdict}). */
    public static final Set<String> SUPPORTED = Set.of("supported");
    public static final Set<String> SUPPORTED_OR_TENTATIVE = Set.of("supported", "tentative");

    public static Expected none(String reason) {
        return new Expected(List.of(new NoStructure()), reason);
    }

    /** Text for the table: the accepted answers joined by {@code or}. */
    public String label() {
        return answers.stream().map(Answer::label).collect(Collectors.joining(" or "));
    }
}
