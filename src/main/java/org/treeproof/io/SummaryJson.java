package org.treeproof.io;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.util.List;
import org.treeproof.explain.Explanation;
import org.treeproof.score.GapResult;
import org.treeproof.score.ReplicateSummary;
import org.treeproof.study.ClusterEvidence;
import org.treeproof.study.CutHeight;
import org.treeproof.study.Evidence;
import org.treeproof.study.KEvidence;
import org.treeproof.study.LinkageEvidence;
import org.treeproof.study.NullStability;
import org.treeproof.study.Recommendation;
import org.treeproof.study.StudySettings;
import org.treeproof.tree.Linkage;

/**
 * Writes {@code summary.json}: the evidence table and the recommendation, in the layout scripts rely on.
 *
 * <p>The output is a pure function of its inputs (no time stamps, no thread count), so two runs of the same
 * study give identical bytes. Numbers are written at full precision (shortest round-trip form); values that
 * are not finite are written as {@code null}.
 */
public final class SummaryJson {
    private final Evidence evidence;
    private final Recommendation recommendation;
    private final Provenance provenance;
    private final java.util.function.Function<org.treeproof.study.Reason, String> wording;
    private final java.util.function.Function<org.treeproof.explain.CovariateFlag, String> flagWording;
    private final Explanation explanation;

    /**
     * Where the data came from and how it was prepared.
     *
     * @param toolName    the tool's name
     * @param toolVersion the tool's version
     * @param inputPath   the input file as given
     * @param sha256      the SHA-256 of the input file's bytes
     * @param preparation the preparation steps, as sentences, in order
     * @param cautions    what the preparation found that bears on the result (warnings and notes), as sentences
     * @param inputOptions the effective input options (name → value), in a stable order
     * @param labels      comparison with known labels, or {@code null}
     */
    public record Provenance(String toolName, String toolVersion, String inputPath, String sha256,
            List<String> preparation, List<String> cautions, List<Option> inputOptions, LabelsSummary labels) {
        /** A provenance whose preparation gave no caution. */
        public Provenance(String toolName, String toolVersion, String inputPath, String sha256,
                List<String> preparation, List<Option> inputOptions, LabelsSummary labels) {
            this(toolName, toolVersion, inputPath, sha256, preparation, List.of(), inputOptions, labels);
        }

        public Provenance {
            cautions = List.copyOf(cautions);
            preparation = List.copyOf(preparation);
            inputOptions = List.copyOf(inputOptions);
        }
    }

    /** One effective option, written as a JSON string, boolean or number as its value is. */
    public record Option(String name, Object value) {
        public Option {
            java.util.Objects.requireNonNull(name, "name");
            if (!(value instanceof String || value instanceof Boolean || value instanceof Integer)) {
                throw new IllegalArgumentException("option " + name + ": a string, boolean or int, not " + value);
            }
        }
    }

    /** The recommended solution against known labels. */
    public record LabelsSummary(String file, double ari, List<String> classes, int[][] table, int[] outliers) {
    }

    /**
     * @param wording the report's sentence for each reason (JSON carries each reason's kind and its sentence;
     *                the wording has one owner, the report)
     */
    public SummaryJson(Evidence evidence, Recommendation recommendation, Provenance provenance,
            java.util.function.Function<org.treeproof.study.Reason, String> wording) {
        this(evidence, recommendation, provenance, wording, null, null);
    }

    /**
     * With the explanation of the recommended solution ({@code null} for none): the {@code explain} block, and the
     * report's sentence for each flagged covariate ({@code flagWording}, needed when there is an explanation).
     */
    public SummaryJson(Evidence evidence, Recommendation recommendation, Provenance provenance,
            java.util.function.Function<org.treeproof.study.Reason, String> wording, Explanation explanation,
            java.util.function.Function<org.treeproof.explain.CovariateFlag, String> flagWording) {
        if (explanation != null) {
            java.util.Objects.requireNonNull(flagWording, "flagWording");
        }
        this.wording = wording;
        this.flagWording = flagWording;
        this.evidence = evidence;
        this.recommendation = recommendation;
        this.provenance = provenance;
        this.explanation = explanation;
    }

    /** The JSON as UTF-8 bytes, pretty-printed, ending with a newline. */
    public byte[] toBytes() {
        var out = new ByteArrayOutputStream();
        try {
            write(out);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toByteArray();
    }

    public void write(OutputStream out) throws IOException {
        try (JsonGenerator g = new JsonFactory().createGenerator(out, JsonEncoding.UTF8)) {
            g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
            g.setPrettyPrinter(new DefaultPrettyPrinter());
            g.writeStartObject();
            g.writeObjectFieldStart("tool");
            g.writeStringField("name", provenance.toolName());
            g.writeStringField("version", provenance.toolVersion());
            g.writeEndObject();
            writeInput(g);
            writeSettings(g, evidence.settings());
            g.writeArrayFieldStart("linkages");
            for (LinkageEvidence le : evidence.linkages()) {
                writeLinkage(g, le);
            }
            g.writeEndArray();
            writeRecommendation(g);
            if (provenance.labels() != null) {
                writeLabels(g, provenance.labels());
            }
            if (explanation != null) {
                ExplainJson.write(g, explanation);
            }
            g.writeEndObject();
            g.writeRaw('\n');
        }
    }

    private void writeInput(JsonGenerator g) throws IOException {
        g.writeObjectFieldStart("input");
        g.writeStringField("path", provenance.inputPath());
        g.writeStringField("sha256", provenance.sha256());
        g.writeNumberField("samples", evidence.samples());
        g.writeNumberField("features", evidence.features());
        g.writeArrayFieldStart("preparation");
        for (String s : provenance.preparation()) {
            g.writeString(s);
        }
        g.writeEndArray();
        g.writeArrayFieldStart("cautions");
        for (String s : provenance.cautions()) {
            g.writeString(s);
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    private void writeSettings(JsonGenerator g, StudySettings s) throws IOException {
        g.writeObjectFieldStart("settings");
        // a distance table's metric is the user's, unknown here, as the tree command says
        g.writeStringField("metric", evidence.features() == 0 ? org.treeproof.distance.Metric.PRECOMPUTED
                : s.metric().id());
        g.writeArrayFieldStart("linkages");
        for (Linkage l : s.linkages()) {
            g.writeString(l.id());
        }
        g.writeEndArray();
        g.writeNumberField("maxK", s.maxK());
        g.writeNumberField("replicates", s.replicates());
        g.writeStringField("resampling", s.resampling().id());
        g.writeNumberField("sampleFraction", s.sampleFraction());
        g.writeNumberField("featureFraction", s.featureFraction());
        // Only settings that took effect: the gap reference kind and null replicates only when those parts ran.
        g.writeNumberField("referenceSets", s.referenceSets());
        if (s.referenceSets() > 0) {
            g.writeStringField("gapReference", s.gapReference().userName());
        }
        g.writeNumberField("nullSets", s.nullSets());
        if (s.nullSets() > 0) {
            g.writeNumberField("nullReplicates", s.nullReplicates());
        }
        g.writeObjectFieldStart("pacInterval");
        g.writeNumberField("low", s.pacLow());
        g.writeNumberField("high", s.pacHigh());
        g.writeEndObject();
        g.writeNumberField("seed", s.seed());
        BranchPValueJson.writeSettings(g, s.branchPValues());
        g.writeNumberField("minClusterSize", evidence.minClusterSize());
        for (Option o : provenance.inputOptions()) {
            if (o.value() instanceof Boolean b) {
                g.writeBooleanField(o.name(), b);
            } else if (o.value() instanceof Integer i) {
                g.writeNumberField(o.name(), i);
            } else {
                g.writeStringField(o.name(), (String) o.value());
            }
        }
        g.writeObjectFieldStart("decisionRule");
        var r = recommendation.rule();
        g.writeNumberField("alpha", r.alpha());
        g.writeNumberField("stableJaccard", r.stableJaccard());
        g.writeNumberField("dissolvedJaccard", r.dissolvedJaccard());
        g.writeNumberField("reasonableSilhouette", r.reasonableSilhouette());
        g.writeNumberField("weakSilhouette", r.weakSilhouette());
        g.writeNumberField("unstableSample", r.unstableSample());
        g.writeEndObject();
        g.writeEndObject();
    }

    private void writeLinkage(JsonGenerator g, LinkageEvidence le) throws IOException {
        g.writeStartObject();
        g.writeStringField("linkage", le.linkage().id());
        number(g, "copheneticCorrelation", le.copheneticCorrelation());
        g.writeBooleanField("monotone", le.tree().monotone());
        if (le.gap() != null) {
            g.writeNumberField("gapChoice", le.gapChoice());
        } else {
            g.writeNullField("gapChoice");
        }
        if (le.gap() != null) {
            writeGap(g, le.gap());
        }
        g.writeArrayFieldStart("byK");
        for (KEvidence e : le.byK()) {
            writeK(g, e, recommendation.assessment(le.linkage(), e.k()), le);
        }
        g.writeEndArray();
        g.writeArrayFieldStart("branchSupport");
        double[] support = le.branchSupport();
        for (int s = 0; s < support.length; s++) {
            g.writeStartObject();
            g.writeNumberField("merge", s);
            g.writeNumberField("size", le.tree().size(s));
            number(g, "height", le.tree().height(s));
            number(g, "support", support[s]);
            if (le.branchPValues() != null) {
                BranchPValueJson.write(g, le.branchPValues().at(s));
            }
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    private static void writeGap(JsonGenerator g, GapResult gap) throws IOException {
        g.writeObjectFieldStart("gap");
        g.writeNumberField("referenceSets", gap.referenceSets());
        g.writeBooleanField("ruleMet", gap.ruleMet());
        g.writeArrayFieldStart("byK");
        double[] logW = gap.logW();
        double[] ref = gap.referenceMeanLogW();
        double[] gv = gap.gap();
        double[] sd = gap.sd();
        double[] se = gap.se();
        for (int k = 1; k <= gap.maxK(); k++) {
            g.writeStartObject();
            g.writeNumberField("k", k);
            number(g, "logW", logW[k - 1]);
            number(g, "referenceMeanLogW", ref[k - 1]);
            number(g, "gap", gv[k - 1]);
            number(g, "sd", sd[k - 1]);
            number(g, "se", se[k - 1]);
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    private static void writeK(JsonGenerator g, KEvidence e, org.treeproof.study.Assessment as, LinkageEvidence le)
            throws IOException {
        g.writeStartObject();
        g.writeNumberField("k", e.k());
        g.writeNumberField("outliers", e.outliers());
        g.writeNumberField("branches", e.branches());
        if (as != null) {
            g.writeStringField("verdict", as.verdict().id());
            g.writeArrayFieldStart("conditionsMet");
            for (var c : as.met()) {
                g.writeString(c.id());
            }
            g.writeEndArray();
            g.writeArrayFieldStart("conditionsFailed");
            for (var c : as.failed()) {
                g.writeString(c.id());
            }
            g.writeEndArray();
        }
        cutHeight(g, "cutHeight", e.cutHeight());
        g.writeBooleanField("tieDependent", e.tieDependent());
        for (org.treeproof.study.Criterion c : org.treeproof.study.Criterion.fitMeasures()) {
            number(g, c.key(), c.of(e));
        }
        number(g, "gap", e.gap());
        number(g, "gapSE", e.gapSE());
        separation(g, e.separation());
        g.writeObjectFieldStart("stability");
        ReplicateSummary a = e.stability().ari();
        g.writeNumberField("replicates", a.count());
        number(g, "ariMean", a.mean());
        number(g, "ariSD", a.sd());
        number(g, "ariLow", a.low());
        number(g, "ariHigh", a.high());
        number(g, "pac", e.stability().pac());
        NullStability n = e.stability().nullModel();
        if (n == null) {
            g.writeNullField("null");
        } else {
            g.writeObjectFieldStart("null");
            g.writeNumberField("sets", n.sets());
            g.writeNumberField("replicatesPerSet", n.replicatesPerSet());
            number(g, "ariMean", n.ariMean());
            number(g, "ariSD", n.ariSD());
            number(g, "ariLow", n.ariLow());
            number(g, "ariHigh", n.ariHigh());
            number(g, "pacMean", n.pacMean());
            number(g, "silhouetteMean", n.silhouetteMean());
            number(g, "silhouetteSD", n.silhouetteSD());
            number(g, "silhouetteLow", n.silhouetteLow());
            number(g, "silhouetteHigh", n.silhouetteHigh());
            number(g, "excess", n.excess());
            number(g, "testExcess", n.testExcess());
            number(g, "pValueAdjusted", n.pValueAdjusted());
            g.writeEndObject();
        }
        g.writeEndObject();
        g.writeArrayFieldStart("clusters");
        for (ClusterEvidence c : e.clusters()) {
            g.writeStartObject();
            g.writeNumberField("id", c.id());
            g.writeNumberField("size", c.size());
            number(g, "jaccard", c.jaccard());
            number(g, "dissolvedShare", c.dissolvedShare());
            number(g, "recoveredShare", c.recoveredShare());
            g.writeStringField("status", c.status().label());
            g.writeEndObject();
        }
        g.writeEndArray();
        BranchPValueJson.writeCdf(g, le.cdfAt(e.k()), le.consensus().distribution(e.k()));
        g.writeEndObject();
    }

    private void writeRecommendation(JsonGenerator g) throws IOException {
        Recommendation r = recommendation;
        g.writeObjectFieldStart("recommendation");
        g.writeStringField("linkage", r.linkage().id());
        g.writeNumberField("k", r.k());
        cutHeight(g, "cutHeight", r.cutHeight());
        g.writeStringField("verdict", r.verdict().id());
        g.writeArrayFieldStart("levels");
        for (int k : r.levels()) {
            g.writeNumber(k);
        }
        g.writeEndArray();
        g.writeArrayFieldStart("reasons");
        // a covariate the clusters follow leads the reasons (the explanation's own sentence)
        if (explanation != null) {
            for (String flag : ExplainJson.withFlags(List.of(), explanation, flagWording)) {
                g.writeStartObject();
                g.writeStringField("kind", "covariate-followed");
                g.writeStringField("text", flag);
                g.writeEndObject();
            }
        }
        for (org.treeproof.study.Reason reason : r.reasons()) {
            g.writeStartObject();
            g.writeStringField("kind", reason.kind());
            g.writeStringField("text", wording.apply(reason));
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeNumberField("minClusterSize", r.minClusterSize());
        g.writeArrayFieldStart("outliers");
        for (int i : r.clustering().outliers()) {
            g.writeString(evidence.sampleIds().get(i));
        }
        g.writeEndArray();
        var t = r.structureTest();
        if (t == null) {
            g.writeNullField("structureTest");
        } else {
            g.writeObjectFieldStart("structureTest");
            number(g, "statistic", t.statistic());
            number(g, "pValue", t.pValue());
            number(g, "pValueFitted", t.pValueFitted());
            g.writeNumberField("nullSets", t.nullSets());
            g.writeNumberField("replicatesPerSet", t.replicatesPerSet());
            g.writeStringField("method", org.treeproof.study.StructureTest.METHOD);
            g.writeArrayFieldStart("nullMaxima");
            for (double v : t.nullMaxima()) {
                number(g, v);
            }
            g.writeEndArray();
            g.writeEndObject();
        }
        g.writeArrayFieldStart("replicateVotes");
        for (Recommendation.KShare v : r.votes()) {
            g.writeStartObject();
            g.writeNumberField("k", v.k());
            number(g, "share", v.share());
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeArrayFieldStart("criteria");
        for (Recommendation.CriterionChoice c : r.criteria()) {
            g.writeStartObject();
            g.writeStringField("criterion", c.name());
            g.writeNumberField("k", c.k());
            g.writeStringField("basis", c.basis());
            g.writeEndObject();
        }
        g.writeEndArray();
        // the recommended clusters as clusters.csv has them (samples set aside as far after the cut left out), and
        // those below the stable band
        writeClusters(g, "clusters", r.clusters());
        writeClusters(g, "flaggedClusters", r.flaggedClusters());
        BranchPValueJson.writeClusterBranches(g, evidence, r);
        g.writeArrayFieldStart("flaggedSamples");
        for (Recommendation.SampleFlag f : r.flaggedSamples()) {
            g.writeStartObject();
            g.writeStringField("sample", f.sampleId());
            g.writeNumberField("cluster", f.cluster());
            number(g, "stability", f.stability());
            number(g, "silhouette", f.silhouette());
            g.writeBooleanField("unstable", f.unstable());
            g.writeBooleanField("negativeSilhouette", f.negativeSilhouette());
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeArrayFieldStart("linkageComparison");
        for (Recommendation.LinkageSummary s : r.linkages()) {
            g.writeStartObject();
            g.writeStringField("linkage", s.linkage().id());
            number(g, "copheneticCorrelation", s.copheneticCorrelation());
            g.writeNumberField("k", s.k());
            g.writeStringField("verdict", s.verdict().id());
            number(g, "ariMean", s.ariMean());
            number(g, "pac", s.pac());
            number(g, "silhouette", s.silhouette());
            number(g, "smallestJaccard", s.worstJaccard());
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeArrayFieldStart("agreement");
        for (double[] row : r.agreement()) {
            g.writeStartArray();
            for (double v : row) {
                number(g, v);
            }
            g.writeEndArray();
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    private static void writeLabels(JsonGenerator g, LabelsSummary l) throws IOException {
        g.writeObjectFieldStart("labels");
        g.writeStringField("file", l.file());
        number(g, "ari", l.ari());
        g.writeArrayFieldStart("classes");
        for (String c : l.classes()) {
            g.writeString(c);
        }
        g.writeEndArray();
        g.writeArrayFieldStart("table");
        for (int[] row : l.table()) {
            g.writeStartArray();
            for (int v : row) {
                g.writeNumber(v);
            }
            g.writeEndArray();
        }
        g.writeEndArray();
        g.writeArrayFieldStart("outliers");
        for (int v : l.outliers()) {
            g.writeNumber(v);
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    private static void cutHeight(JsonGenerator g, String field, CutHeight h) throws IOException {
        g.writeObjectFieldStart(field);
        number(g, "low", h.low());
        number(g, "high", h.high());
        number(g, "chosen", h.chosen());
        g.writeEndObject();
    }

    private static void writeClusters(JsonGenerator g, String field, List<ClusterEvidence> clusters)
            throws IOException {
        g.writeArrayFieldStart(field);
        for (ClusterEvidence c : clusters) {
            g.writeStartObject();
            g.writeNumberField("id", c.id());
            g.writeNumberField("size", c.size());
            number(g, "jaccard", c.jaccard());
            g.writeStringField("status", c.status().label());
            g.writeEndObject();
        }
        g.writeEndArray();
    }

    private static void number(JsonGenerator g, String field, double v) throws IOException {
        g.writeFieldName(field);
        number(g, v);
    }

    private static void number(JsonGenerator g, double v) throws IOException {
        if (Double.isFinite(v)) {
            g.writeNumber(v);
        } else {
            g.writeNull();
        }
    }

    /** Each cluster's dip test against its nearest cluster ({@code null} when not assessed). */
    private static void separation(JsonGenerator g, org.treeproof.score.Separation.Result s) throws IOException {
        if (s == null || !s.assessed()) {
            g.writeNullField("separation");
            return;
        }
        g.writeObjectFieldStart("separation");
        number(g, "pValue", s.pValue());
        g.writeArrayFieldStart("clusters");
        for (var c : s.clusters()) {
            g.writeStartObject();
            g.writeNumberField("cluster", c.cluster() + 1);
            g.writeNumberField("nearest", c.nearest() + 1);
            g.writeNumberField("samples", c.samples());
            number(g, "dip", c.dip());
            number(g, "pValue", c.pValue());
            g.writeBooleanField("pBelow", c.pBelow());
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeEndObject();
    }
}
