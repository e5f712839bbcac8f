package org.treeproof.io;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.treeproof.explain.CovariateFlag;
import org.treeproof.explain.CovariateResult;
import org.treeproof.explain.Explanation;
import org.treeproof.explain.FeatureTable;
import org.treeproof.explain.SensitivityResult;

/** The {@code explain} block of {@code summary.json}: the figures behind the three explanation files. */
final class ExplainJson {
    /** The features per cluster listed in the summary; every feature is in {@code features.csv}. */
    static final int TOP = 10;
    /** The q-value at which the summary counts a feature as distinguishing its cluster. */
    static final double Q_LEVEL = 0.05;

    private ExplainJson() {
    }

    /** The recommendation's reasons followed by the sentence of each flagged covariate. */
    static List<String> withFlags(List<String> reasons, Explanation e,
            java.util.function.Function<CovariateFlag, String> flagWording) {
        var out = new ArrayList<>(reasons);
        for (CovariateFlag f : e.flags()) {
            out.add(flagWording.apply(f));
        }
        return out;
    }

    static void write(JsonGenerator g, Explanation e) throws IOException {
        g.writeObjectFieldStart("explain");
        if (e.solution() != null) {
            g.writeObjectFieldStart("solution");
            g.writeNumberField("k", e.solution().k());
            g.writeNumberField("clustered", e.solution().samples() - e.solution().outliers());
            g.writeNumberField("outliers", e.solution().outliers());
            g.writeEndObject();
        }
        if (e.features() != null) {
            features(g, e.features());
        }
        if (e.covariates() != null) {
            g.writeArrayFieldStart("covariates");
            for (CovariateResult r : e.covariates()) {
                g.writeStartObject();
                g.writeStringField("covariate", r.name());
                g.writeStringField("kind", r.kind().id());
                g.writeStringField("test", r.test().id());
                num(g, "statistic", r.statistic());
                num(g, "pValue", r.pValue());
                num(g, "qValue", r.qValue());
                g.writeStringField("effectName", r.effectName());
                num(g, "effect", r.effect());
                g.writeBooleanField("flagged", r.flagged());
                g.writeNumberField("samples", r.used());
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeArrayFieldStart("flaggedCovariates");
            for (CovariateFlag f : e.flags()) {
                g.writeString(f.covariate());
            }
            g.writeEndArray();
        }
        if (e.sensitivity() != null) {
            sensitivity(g, e.sensitivity());
        }
        g.writeArrayFieldStart("notes");
        for (String n : e.notes()) {
            g.writeString(n);
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    private static void features(JsonGenerator g, FeatureTable t) throws IOException {
        g.writeObjectFieldStart("features");
        g.writeStringField("test", t.test().id());
        g.writeStringField("data", "prepared");
        g.writeNumberField("count", t.features().size());
        g.writeArrayFieldStart("clusters");
        for (int c = 1; c <= t.clusters(); c++) {
            g.writeStartObject();
            g.writeNumberField("cluster", c);
            g.writeNumberField("size", t.clusterSize(c));
            g.writeNumberField("distinguishingAtQ05", t.significant(c, Q_LEVEL));
            g.writeArrayFieldStart("top");
            for (int r = 1; r <= Math.min(TOP, t.features().size()); r++) {
                int j = t.featureAtRank(c, r);
                g.writeStartObject();
                g.writeStringField("feature", t.features().get(j));
                num(g, "effect", t.effect(c, j));
                num(g, "auc", t.auc(c, j));
                num(g, "qValue", t.qValue(c, j));
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    private static void sensitivity(JsonGenerator g, SensitivityResult s) throws IOException {
        g.writeObjectFieldStart("sensitivity");
        g.writeStringField("linkage", s.linkage());
        g.writeNumberField("k", s.k());
        num(g, "survivesAtJaccard", s.survives());
        g.writeArrayFieldStart("alternatives");
        for (SensitivityResult.Row r : s.rows()) {
            g.writeStartObject();
            g.writeStringField("alternative", r.name());
            g.writeStringField("change", r.change());
            g.writeStringField("librarySize", r.librarySize());
            g.writeStringField("scale", r.scale());
            g.writeBooleanField("log2", r.log2());
            g.writeNumberField("topVariable", r.topVariable());
            g.writeStringField("metric", r.metric());
            num(g, "ari", r.ari());
            g.writeArrayFieldStart("jaccard");
            for (double j : r.jaccard()) {
                g.writeNumber(j);
            }
            g.writeEndArray();
            if (!r.ran()) {
                g.writeStringField("note", r.note());
            }
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    private static void num(JsonGenerator g, String name, double v) throws IOException {
        if (Double.isFinite(v)) {
            g.writeNumberField(name, v);
        } else {
            g.writeNullField(name);
        }
    }
}
