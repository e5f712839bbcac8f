package org.treeproof.io;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import org.treeproof.score.ConsensusCdf;
import org.treeproof.score.ConsensusDistribution;
import org.treeproof.score.MultiscaleFit;
import org.treeproof.study.BranchPValueSettings;
import org.treeproof.study.ClusterBranch;
import org.treeproof.study.Evidence;
import org.treeproof.study.LinkageEvidence;
import org.treeproof.study.Recommendation;

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
 *       are more), {@code consensusArea} and {@code deltaArea};</li>
 *   <li>{@code recommendation.clusterBranches[]}: {@code {id, size, merge, au, auSE, lowAu}} per recommended cluster,
 *       only when branch p-values were computed.</li>
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

    /**
     * {@code recommendation.clusterBranches}: the branch of each recommended cluster with its AU p-value and whether it
     * is flagged for a low one ({@link ClusterBranch#lowAu()}); only when branch p-values were computed and clusters
     * are recommended.
     */
    static void writeClusterBranches(JsonGenerator g, Evidence evidence, Recommendation r) throws IOException {
        if (r.k() < 2) {
            return;
        }
        LinkageEvidence le = evidence.linkages().stream().filter(l -> l.linkage() == r.linkage()).findFirst()
                .orElseThrow();
        if (le.branchPValues() == null) {
            return;
        }
        g.writeArrayFieldStart("clusterBranches");
        for (ClusterBranch b : le.clusterBranches(r.k())) {
            g.writeStartObject();
            g.writeNumberField("id", b.cluster());
            g.writeNumberField("size", b.size());
            if (b.merge() >= 0) {
                g.writeNumberField("merge", b.merge());
            } else {
                g.writeNullField("merge");
            }
            number(g, "au", b.au());
            number(g, "auSE", b.fit() == null ? Double.NaN : b.fit().auSE());
            g.writeBooleanField("lowAu", b.lowAu());
            g.writeEndObject();
        }
        g.writeEndArray();
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
