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
import org.treeproof.study.Recommender;

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
    public static final List<String> SCORE_COLUMNS = List.of("linkage", "k", "cutHeightLow", "cutHeightHigh",
            "cutHeightChosen", "tieDependent", "silhouette", "calinskiHarabasz", "daviesBouldin", "dunn", "gap", "gapSE",
            "ariMean", "ariSD", "ariLow", "ariHigh", "pac", "nullAriMean", "nullAriLow", "nullAriHigh", "nullPacMean",
            "nullSilhouetteMean", "pValueAri", "pValuePac", "pValueSilhouette", "pValueCombined", "smallestJaccard", "doubtfulClusters", "dissolvedClusters", "verdict");

    /** {@code clusters.csv}: per sample, its cluster in the recommended solution and its flags. */
    public static String clusters(Evidence evidence, Recommendation r) {
        var rows = new ArrayList<List<String>>();
        int n = evidence.samples();
        if (r.k() == 1) {
            for (int i = 0; i < n; i++) {
                rows.add(List.of(text(evidence.sampleIds().get(i)), "1", "", "", ""));
            }
            return csv(CLUSTER_COLUMNS, rows);
        }
        KEvidence e = evidence.linkages().stream().filter(le -> le.linkage() == r.linkage()).findFirst()
                .orElseThrow().at(r.k());
        double[] st = e.sampleStability();
        double[] sil = e.sampleSilhouette();
        double unstable = r.rule().unstableSample();
        for (int i = 0; i < n; i++) {
            var flags = new ArrayList<String>();
            if (st[i] < unstable) {
                flags.add("unstable");
            }
            if (sil[i] < 0) {
                flags.add("negative-silhouette");
            }
            rows.add(List.of(text(evidence.sampleIds().get(i)), String.valueOf(e.partition().label(i) + 1), num(st[i]),
                    num(sil[i]), String.join(";", flags)));
        }
        return csv(CLUSTER_COLUMNS, rows);
    }

    /** {@code scores.csv}: every measure for every linkage and k. */
    public static String scores(Evidence evidence, Recommendation r) {
        Recommender verdicts = Recommender.of(evidence, r.rule());
        var rows = new ArrayList<List<String>>();
        for (LinkageEvidence le : evidence.linkages()) {
            for (KEvidence e : le.byK()) {
                ReplicateSummary a = e.stability().ari();
                NullStability ns = e.stability().nullModel();
                int doubtful = 0;
                int dissolved = 0;
                for (ClusterEvidence c : e.clusters()) {
                    doubtful += c.status() == JaccardStability.Status.DOUBTFUL ? 1 : 0;
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
                row.add(num(e.silhouette()));
                row.add(num(e.calinskiHarabasz()));
                row.add(num(e.daviesBouldin()));
                row.add(num(e.dunn()));
                row.add(num(e.gap()));
                row.add(num(e.gapSE()));
                row.add(num(a.mean()));
                row.add(num(a.sd()));
                row.add(num(a.low()));
                row.add(num(a.high()));
                row.add(num(e.stability().pac()));
                row.add(ns == null ? "" : num(ns.ariMean()));
                row.add(ns == null ? "" : num(ns.ariLow()));
                row.add(ns == null ? "" : num(ns.ariHigh()));
                row.add(ns == null ? "" : num(ns.pacMean()));
                row.add(ns == null ? "" : num(ns.silhouetteMean()));
                row.add(ns == null ? "" : num(ns.pValueAri()));
                row.add(ns == null ? "" : num(ns.pValuePac()));
                row.add(ns == null ? "" : num(ns.pValueSilhouette()));
                row.add(ns == null ? "" : num(ns.pValueCombined()));
                row.add(num(e.worstJaccard()));
                row.add(String.valueOf(doubtful));
                row.add(String.valueOf(dissolved));
                row.add(verdicts.verdictOf(e).id());
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
