package org.treeproof.io;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.treeproof.explain.CovariateResult;
import org.treeproof.explain.FeatureTable;
import org.treeproof.explain.SensitivityResult;

/**
 * Writes {@code features.csv}, {@code covariates.csv} and {@code sensitivity.csv}, in the style of
 * {@link CsvOutputs}: quoted where needed, full precision, empty for a value that is not a number, names that a
 * spreadsheet would run as a formula neutralised.
 */
public final class ExplainCsv {
    private ExplainCsv() {
    }

    /** The columns of {@code features.csv}. */
    public static final List<String> FEATURE_COLUMNS = List.of("cluster", "feature", "rank", "effect", "auc",
            "meanInCluster", "meanElsewhere", "pValue", "qValue");

    /** The columns of {@code covariates.csv}. */
    public static final List<String> COVARIATE_COLUMNS = List.of("covariate", "kind", "test", "statistic", "pValue",
            "qValue", "effect", "flagged");

    /** The columns of {@code sensitivity.csv}. */
    public static final List<String> SENSITIVITY_COLUMNS = List.of("alternative", "change", "librarySize", "scale", "log2",
            "topVariable", "metric", "ari", "clustersSurviving", "jaccardByCluster", "note");

    /** Every (cluster, feature), clusters in order and features by rank within each. */
    public static String features(FeatureTable t) {
        var out = new StringWriter(64 * t.clusters() * t.features().size());
        try (var p = printer(out, FEATURE_COLUMNS)) {
            int m = t.features().size();
            for (int c = 1; c <= t.clusters(); c++) {
                String cluster = String.valueOf(c);
                for (int r = 1; r <= m; r++) {
                    int j = t.featureAtRank(c, r);
                    p.printRecord(cluster, CsvOutputs.text(t.features().get(j)), String.valueOf(r),
                            CsvOutputs.num(t.effect(c, j)), CsvOutputs.num(t.auc(c, j)), CsvOutputs.num(t.meanIn(c, j)),
                            CsvOutputs.num(t.meanElsewhere(c, j)), CsvOutputs.num(t.pValue(c, j)),
                            CsvOutputs.num(t.qValue(c, j)));
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    /** One row per covariate, in the file's order. */
    public static String covariates(List<CovariateResult> results) {
        var out = new StringWriter();
        try (var p = printer(out, COVARIATE_COLUMNS)) {
            for (CovariateResult r : results) {
                p.printRecord(CsvOutputs.text(r.name()), r.kind().id(), r.test().id(), CsvOutputs.num(r.statistic()),
                        CsvOutputs.num(r.pValue()), CsvOutputs.num(r.qValue()), CsvOutputs.num(r.effect()),
                        String.valueOf(r.flagged()));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    /** One row per alternative analysis; the Jaccard values are per chosen cluster, in cluster order, ';'-separated. */
    public static String sensitivity(SensitivityResult s) {
        var out = new StringWriter();
        try (var p = printer(out, SENSITIVITY_COLUMNS)) {
            for (SensitivityResult.Row r : s.rows()) {
                var jac = new ArrayList<String>();
                for (double j : r.jaccard()) {
                    jac.add(CsvOutputs.num(j));
                }
                p.printRecord(r.name(), r.change(), r.librarySize(), r.scale(), String.valueOf(r.log2()), String.valueOf(r.topVariable()),
                        r.metric(), CsvOutputs.num(r.ari()), r.ran() ? String.valueOf(r.surviving(s.survives())) : "",
                        String.join(";", jac), r.note());
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    private static CSVPrinter printer(StringWriter out, List<String> header) throws IOException {
        return new CSVPrinter(out, CSVFormat.RFC4180.builder().setRecordSeparator("\n")
                .setHeader(header.toArray(String[]::new)).get());
    }
}
