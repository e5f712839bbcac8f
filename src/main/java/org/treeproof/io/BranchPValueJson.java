package org.treeproof.io;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import org.treeproof.score.ConsensusCdf;
import org.treeproof.score.ConsensusDistribution;
import org.treeproof.score.MultiscaleFit;
import org.treeproof.study.BranchPValueSettings;

/**
 * The parts of {@code summary.json} for branch p-values and the consensus CDF, written into the objects that
 * {@link SummaryJson} opens:
 * <ul>
 *   <li>{@code settings.branchPValues}: {@code {scales, replicatesPerScale}}, or {@code null} when not computed;</li>
 *   <li>{@code linkages[].branchSupport[]} gains {@code au}, {@code auSE}, {@code bp}, {@code bpSE} (shares in
 *       [0, 1], {@code null} where no number is given) and {@code pvalueFit {status, chiSquare, df, pValue,
 *       scalesUsed, note}}, only when branch p-values were computed;</li>
 *   <li>{@code linkages[].byK[]} gains {@code consensusCdf} ({@code [x, F(x)]} pairs, non-decreasing, ending at
 *       F = 1; every distinct value, or {@value ConsensusCdf#OUTPUT_POINTS} evenly spaced exact points when there
 *       are more), {@code consensusArea} and {@code deltaArea}.</li>
 * </ul>
 */
final class BranchPValueJson {
    private BranchPValueJson() {
    }

    static void writeSettings(JsonGenerator g, BranchPValueSettings s) throws IOException {
        if (s == null) {
            g.writeNullField("branchPValues");
            return;
        }
        g.writeObjectFieldStart("branchPValues");
        g.writeArrayFieldStart("scales");
        for (double r : s.scales()) {
            g.writeNumber(r);
        }
        g.writeEndArray();
        g.writeNumberField("replicatesPerScale", s.replicatesPerScale());
        g.writeEndObject();
    }

    static void write(JsonGenerator g, MultiscaleFit.Result r) throws IOException {
        number(g, "au", r.au());
        number(g, "auSE", r.auSE());
        number(g, "bp", r.bp());
        number(g, "bpSE", r.bpSE());
        g.writeObjectFieldStart("pvalueFit");
        g.writeStringField("status", r.status().label());
        number(g, "chiSquare", r.chiSquare());
        g.writeNumberField("df", r.df());
        number(g, "pValue", r.fitPValue());
        g.writeNumberField("scalesUsed", r.scalesUsed());
        g.writeStringField("note", r.reason());
        g.writeEndObject();
    }

    static void writeCdf(JsonGenerator g, ConsensusCdf cdf, ConsensusDistribution d) throws IOException {
        g.writeArrayFieldStart("consensusCdf");
        for (double[] p : cdf.points(d, ConsensusCdf.OUTPUT_POINTS)) {
            g.writeStartArray();
            g.writeNumber(p[0]);
            g.writeNumber(p[1]);
            g.writeEndArray();
        }
        g.writeEndArray();
        number(g, "consensusArea", cdf.area());
        number(g, "deltaArea", cdf.deltaArea());
    }

    private static void number(JsonGenerator g, String field, double v) throws IOException {
        g.writeFieldName(field);
        if (Double.isFinite(v)) {
            g.writeNumber(v);
        } else {
            g.writeNull();
        }
    }
}
