package org.treeproof.io;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.treeproof.score.JaccardStability;
import org.treeproof.score.ReplicateSummary;
import org.treeproof.study.ClusterEvidence;
import org.treeproof.study.Evidence;
import org.treeproof.study.KEvidence;
import org.treeproof.study.LinkageEvidence;
import org.treeproof.study.NullStability;
import org.treeproof.study.Recommendation;

/**
 * Writes {@code clusters.csv} (one row per sample, the recommended solution) and {@code scores.csv} (one row
 * per linkage and k). Fields are quoted where needed (commons-csv), numbers use a dot and full precision,
 * missing values are empty, and text a spreadsheet would run as a formula is neutralised.
 */
public final class CsvOutputs {
    private CsvOutputs() {
    }

    /** The columns of {@code clusters.csv}. */
    public static final List<String> CLUSTER_COLUMNS = List.of("sample", "cluster", "stability", "silhouette", "flag");

    /** The columns of {@code scores.csv}. */
    public static final List<String> SCORE_COLUMNS = columns();

    private static List<String> columns() {
        var c = new ArrayList<String>(List.of("linkage", "k", "cutHeightLow", "cutHeightHigh", "cutHeightChosen",
                "tieDependent"));
        for (org.treeproof.study.Criterion m : org.treeproof.study.Criterion.fitMeasures()) {
            c.add(m.key());
        }
        c.addAll(List.of("gap", "gapSE", "ariMean", "ariSD", "ariLow", "ariHigh", "pac", "nullAriMean", "nullAriSD", "nullPacMean",
            "nullSilhouetteMean", "nullSilhouetteSD", "excess", "pValueAdjusted", "smallestJaccard", "doubtfulClusters",
            "dissolvedClusters", "separationP", "outliers", "verdict"));
        return List.copyOf(c);
    }

    /**
     * {@code clusters.csv}: per sample, its cluster in the recommended solution and its flags, as the
     * recommendation made them: {@code outlier} (set aside, empty cluster), {@code unstable},
     * {@code negative-silhouette}.
     */
    public static String clusters(Evidence evidence, Recommendation r) {
        var rows = new ArrayList<List<String>>();
        int n = evidence.samples();
        var flags = new java.util.HashMap<Integer, Recommendation.SampleFlag>();
        for (Recommendation.SampleFlag f : r.flaggedSamples()) {
            flags.put(f.sample(), f);
        }
        KEvidence e = r.k() == 1 ? null : evidence.linkages().stream().filter(le -> le.linkage() == r.linkage())
                .findFirst().orElseThrow().at(r.k());
        double[] st = e == null ? null : e.sampleStability();
        double[] sil = e == null ? null : e.sampleSilhouette();
        for (int i = 0; i < n; i++) {
            String id = text(evidence.sampleIds().get(i));
            if (r.clustering().isOutlier(i)) {
                rows.add(List.of(id, "", "", "", "outlier"));
                continue;
            }
            String cluster = String.valueOf(r.clustering().label(i) + 1);
            if (e == null) {
                rows.add(List.of(id, cluster, "", "", ""));
                continue;
            }
            var f = flags.get(i);
            var words = new ArrayList<String>();
            if (f != null && f.unstable()) {
                words.add("unstable");
            }
            if (f != null && f.negativeSilhouette()) {
                words.add("negative-silhouette");
            }
            rows.add(List.of(id, cluster, num(st[i]), num(sil[i]), String.join(";", words)));
        }
        return csv(CLUSTER_COLUMNS, rows);
    }

    /** {@code scores.csv}: every measure for every linkage and k. */
    public static String scores(Evidence evidence, Recommendation r) {
        var rows = new ArrayList<List<String>>();
        for (LinkageEvidence le : evidence.linkages()) {
            for (KEvidence e : le.byK()) {
                ReplicateSummary a = e.stability().ari();
                NullStability ns = e.stability().nullModel();
                var assessment = r.assessment(le.linkage(), e.k());
                int doubtful = assessment.facts().doubtfulClusters();
                int dissolved = 0;
                for (ClusterEvidence c : e.clusters()) {
                    dissolved += c.status() == JaccardStability.Status.DISSOLVED
                            || c.status() == JaccardStability.Status.NOT_ASSESSED ? 1 : 0;
                }
                var row = new ArrayList<String>(SCORE_COLUMNS.size());
                row.add(le.linkage().id());
                row.add(String.valueOf(e.k()));
                row.add(num(e.cutHeight().low()));
                row.add(num(e.cutHeight().high()));
                row.add(num(e.cutHeight().chosen()));
                row.add(String.valueOf(e.tieDependent()));
                for (org.treeproof.study.Criterion c : org.treeproof.study.Criterion.fitMeasures()) {
                    row.add(num(c.of(e)));
                }
                row.add(num(e.gap()));
                row.add(num(e.gapSE()));
                row.add(num(a.mean()));
                row.add(num(a.sd()));
                row.add(num(a.low()));
                row.add(num(a.high()));
                row.add(num(e.stability().pac()));
                row.add(ns == null ? "" : num(ns.ariMean()));
                row.add(ns == null ? "" : num(ns.ariSD()));
                row.add(ns == null ? "" : num(ns.pacMean()));
                row.add(ns == null ? "" : num(ns.silhouetteMean()));
                row.add(ns == null ? "" : num(ns.silhouetteSD()));
                row.add(ns == null ? "" : num(ns.excess()));
                row.add(ns == null ? "" : num(ns.pValueAdjusted()));
                row.add(num(e.worstJaccard()));
                row.add(String.valueOf(doubtful));
                row.add(String.valueOf(dissolved));
                row.add(num(e.separationP()));
                row.add(String.valueOf(e.outliers()));
                row.add(assessment.verdict().id());
                rows.add(row);
            }
        }
        return csv(SCORE_COLUMNS, rows);
    }

    private static String csv(List<String> header, List<List<String>> rows) {
        var out = new StringWriter();
        var format = CSVFormat.RFC4180.builder().setRecordSeparator("\n").setHeader(header.toArray(String[]::new))
                .get();
        try (var p = new CSVPrinter(out, format)) {
            for (List<String> row : rows) {
                p.printRecord(row);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    /** A number at full precision, empty when not finite. */
    static String num(double v) {
        return Double.isFinite(v) ? Double.toString(v) : "";
    }

    /** A minus sign followed by a plain decimal number: a spreadsheet reads it as that number and runs nothing. */
    private static final java.util.regex.Pattern NEGATIVE_NUMBER =
            java.util.regex.Pattern.compile("-[0-9]+(\\.[0-9]+)?([eE][-+]?[0-9]+)?");

    /**
     * Neutralises text that a spreadsheet would evaluate: a leading {@code =}, {@code +}, {@code @}, tab or
     * carriage return, or a leading {@code -} that does not start a plain number, gets a leading apostrophe (the
     * OWASP advice on CSV injection). Ids such as {@code -5} or {@code -0.25e3} stay as they are, so joins in R or
     * pandas still match; {@code -2+3} or {@code -A1} are guarded. Numbers written by {@link #num} never pass
     * through here, so negative values stay numbers.
     */
    public static String text(String s) {
        if (s.isEmpty()) {
            return s;
        }
        char c = s.charAt(0);
        if ("=+@\t\r".indexOf(c) >= 0 || (c == '-' && !NEGATIVE_NUMBER.matcher(s).matches())) {
            return "'" + s;
        }
        return s;
    }
}
