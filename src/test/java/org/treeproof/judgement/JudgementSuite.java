package org.treeproof.judgement;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintStream;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.treeproof.judgement.Expected.Answer;
import org.treeproof.judgement.Expected.NoStructure;
import org.treeproof.judgement.Expected.Structure;
import org.treeproof.judgement.JudgementCases.Case;

/**
 * Runs every judgement case through the shaded jar ({@code treeproof assess} with default options, in a fresh JVM as
 * a user would), reads what the study recommended and judges it against the case's accepted answers.
 *
 * <p>What is read: {@code summary.json} {@code recommendation.verdict} and {@code recommendation.k}; the clusters
 * and outliers from {@code clusters.csv} (a sample with an empty {@code cluster} or an {@code outlier} flag is an
 * outlier), so that outliers are seen whichever way the tool marks them. Agreement with the truth is the adjusted Rand
 * index (Hubert &amp; Arabie 1985, Journal of Classification 2:193-218, doi:10.1007/BF01908075) over all samples,
 * each outlier counted as a group of its own on both sides (a planted far point in the truth, a set-aside sample in
 * the result).
 *
 * <p>Used by {@link JudgementIT} and by {@code bench/judgement/run.sh} through {@link #main}.
 */
public final class JudgementSuite {
    private static final ObjectMapper JSON = new ObjectMapper();
    /** Where the open sets are, relative to the project directory. */
    public static final Path OPEN_DIR = Path.of("src", "test", "resources", "judgement", "open");
    /** Where the committed fixed draws are. */
    public static final Path FIXED_DIR = Path.of("src", "test", "resources", "judgement", "fixed");

    /** What the study recommended for one case. */
    public record Got(String verdict, int k, List<Integer> sizes, List<String> outliers, Map<String, String> cluster) {
        /** Cluster sizes, largest first, as text ({@code 60/50/40}); long lists are cut. */
        String sizesText() {
            var s = new StringBuilder();
            for (int i = 0; i < sizes.size(); i++) {
                if (i == 8) {
                    s.append("/...");
                    break;
                }
                s.append(i == 0 ? "" : "/").append(sizes.get(i));
            }
            return s.toString();
        }
    }

    /** The judged result of one case; {@code got} is null when the run failed. */
    public record Outcome(Case c, Got got, double ari, boolean right, String why, double seconds) {
    }

    private final Path jar;
    private final Path work;
    private final List<String> jvm;
    private final int draw;

    /**
     * @param jar  the shaded jar to judge
     * @param work a scratch directory (synthetic sets and study outputs go here)
     * @param jvm  JVM options for each study (e.g. {@code -Xmx3g})
     * @param draw which draw of the synthetic sets (0: the suite; others: fresh data, see
     *             {@link SyntheticSets#all(int)})
     */
    public JudgementSuite(Path jar, Path work, List<String> jvm, int draw) {
        this.jar = jar.toAbsolutePath();
        this.work = work.toAbsolutePath();
        this.jvm = List.copyOf(jvm);
        this.draw = draw;
    }

    /** Runs the cases whose name matches {@code only} (a regular expression; null for all), printing as it goes. */
    public List<Outcome> run(Pattern only, PrintStream progress) throws IOException, InterruptedException {
        Path synthetic = work.resolve("data-" + draw);
        SyntheticSets.writeAll(synthetic, draw);
        var outcomes = new ArrayList<Outcome>();
        for (Case c : JudgementCases.all()) {
            if (only != null && !only.matcher(c.name()).find()) {
                continue;
            }
            Path dir = dirOf(c, synthetic);
            Outcome o = runOne(c, dir);
            outcomes.add(o);
            if (progress != null) {
                progress.println(row(o));
                progress.flush();
            }
        }
        return outcomes;
    }

    private Outcome runOne(Case c, Path dataDir) throws IOException, InterruptedException {
        Path out = work.resolve("out").resolve(c.name());
        deleteTree(out);
        Files.createDirectories(out.getParent());
        var cmd = new ArrayList<String>();
        cmd.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        cmd.addAll(jvm);
        cmd.addAll(List.of("-Djava.awt.headless=true", "-jar", jar.toString(), "assess",
                dataDir.resolve(c.file()).toString(), "--out", out.toString(), "--no-progress", "--quiet"));
        cmd.addAll(c.options());
        Path log = work.resolve("out").resolve(c.name() + ".log");
        long start = System.nanoTime();
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(log.toFile()).start();
        if (!p.waitFor(30, TimeUnit.MINUTES)) {
            p.destroyForcibly();
            return new Outcome(c, null, Double.NaN, false, "timed out", seconds(start));
        }
        double secs = seconds(start);
        if (p.exitValue() != 0) {
            String msg = Files.readString(log, StandardCharsets.UTF_8).strip();
            return new Outcome(c, null, Double.NaN, false, "exit " + p.exitValue() + ": "
                    + msg.lines().findFirst().orElse(""), secs);
        }
        return judgeOutput(c, dataDir, out, secs);
    }

    private static Outcome judgeOutput(Case c, Path dataDir, Path out, double secs) throws IOException {
        Got got = read(out);
        Map<String, String> truth = readTruth(dataDir.resolve(c.truthFile()));
        double ari = ari(truth, got);
        String why = judge(c.expected(), got, ari, truth);
        return new Outcome(c, got, ari, why.isEmpty(), why, secs);
    }

    /**
     * Judges the outputs an earlier {@link #run} left in the work directory, without running any study again (the
     * seconds column is then empty). Cases without output are left out.
     */
    public List<Outcome> rejudge(Pattern only) throws IOException {
        Path synthetic = work.resolve("data-" + draw);
        var outcomes = new ArrayList<Outcome>();
        for (Case c : JudgementCases.all()) {
            Path out = work.resolve("out").resolve(c.name());
            if ((only == null || only.matcher(c.name()).find()) && Files.isRegularFile(out.resolve("summary.json"))) {
                Path dir = dirOf(c, synthetic);
                outcomes.add(judgeOutput(c, dir, out, Double.NaN));
            }
        }
        return outcomes;
    }

    private static double seconds(long start) {
        return (System.nanoTime() - start) / 1e9;
    }

    /** Reads the recommendation of a finished study in {@code dir}. */
    public static Got read(Path dir) throws IOException {
        JsonNode rec = JSON.readTree(dir.resolve("summary.json").toFile()).get("recommendation");
        var cluster = new LinkedHashMap<String, String>();
        var outliers = new ArrayList<String>();
        var counts = new HashMap<String, Integer>();
        try (Reader r = Files.newBufferedReader(dir.resolve("clusters.csv"), StandardCharsets.UTF_8)) {
            for (CSVRecord row : CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(r)) {
                String id = row.get("sample");
                String cl = row.get("cluster").strip();
                String flag = row.isMapped("flag") ? row.get("flag") : "";
                if (cl.isEmpty() || List.of(flag.split(";")).contains("outlier")) {
                    outliers.add(id);
                } else {
                    cluster.put(id, cl);
                    counts.merge(cl, 1, Integer::sum);
                }
            }
        }
        var sizes = new ArrayList<>(counts.values());
        sizes.sort(Comparator.reverseOrder());
        return new Got(rec.get("verdict").asText(), rec.get("k").asInt(), List.copyOf(sizes), List.copyOf(outliers),
                cluster);
    }

    static Map<String, String> readTruth(Path file) throws IOException {
        var truth = new LinkedHashMap<String, String>();
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            for (CSVRecord row : CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(r)) {
                truth.put(row.get(0), row.get(1));
            }
        }
        return truth;
    }

    /**
     * Judges {@code got} against the accepted answers: the empty string when one matches, otherwise why the closest
     * one did not.
     */
    static String judge(Expected expected, Got got, double ari, Map<String, String> truth) {
        var problems = new ArrayList<String>();
        for (Answer a : expected.answers()) {
            String p = check(a, got, ari, truth);
            if (p.isEmpty()) {
                return "";
            }
            problems.add(expected.answers().size() == 1 ? p : "[" + a.label() + "] " + p);
        }
        return String.join("; ", problems);
    }

    private static String check(Answer a, Got got, double ari, Map<String, String> truth) {
        int k = got.sizes().size();
        if (a instanceof NoStructure) {
            return k <= 1 && got.k() <= 1 ? ""
                    : "claims k=" + got.k() + " (" + got.verdict() + ")"
                            + (k != got.k() ? ", clusters.csv has " + k + " clusters" : "");
        }
        var s = (Structure) a;
        var why = new ArrayList<String>();
        if (k != got.k()) {
            why.add("summary k=" + got.k() + " but clusters.csv has " + k);
        }
        if (!s.ks().contains(k)) {
            why.add("k=" + k);
        }
        if (!s.verdicts().contains(got.verdict())) {
            why.add(got.verdict());
        }
        int smallest = got.sizes().isEmpty() ? 0 : got.sizes().get(got.sizes().size() - 1);
        if (k > 1 && smallest < s.minSmallest()) {
            why.add("a cluster of " + smallest);
        }
        if (!Double.isNaN(s.minAri()) && !(ari >= s.minAri())) {
            why.add(String.format(Locale.ROOT, "ARI %.2f", ari));
        }
        if (s.farPointsAside()) {
            long missed = truth.entrySet().stream().filter(e -> e.getValue().equals(SyntheticSets.FAR_POINT))
                    .filter(e -> !got.outliers().contains(e.getKey())).count();
            if (missed > 0) {
                why.add(missed + " far point(s) not set aside");
            }
        }
        return String.join(", ", why);
    }

    /**
     * Adjusted Rand index of the recommended clusters with the truth over all samples; an outlier on either side is a
     * group of its own.
     */
    static double ari(Map<String, String> truth, Got got) {
        var a = new ArrayList<String>();
        var b = new ArrayList<String>();
        for (var e : truth.entrySet()) {
            String t = e.getValue();
            a.add(t.equals(SyntheticSets.FAR_POINT) ? "\u0000" + e.getKey() : t);
            String g = got.cluster().get(e.getKey());
            b.add(g == null ? "\u0000" + e.getKey() : g);
        }
        return adjustedRand(a, b);
    }

    /** Hubert-Arabie adjusted Rand index of two labelings of the same items, from pair counts. */
    static double adjustedRand(List<String> a, List<String> b) {
        int n = a.size();
        var cells = new HashMap<String, Long>();
        var rows = new HashMap<String, Long>();
        var cols = new HashMap<String, Long>();
        for (int i = 0; i < n; i++) {
            cells.merge(a.get(i) + "\u0001" + b.get(i), 1L, Long::sum);
            rows.merge(a.get(i), 1L, Long::sum);
            cols.merge(b.get(i), 1L, Long::sum);
        }
        double index = cells.values().stream().mapToDouble(JudgementSuite::pairs).sum();
        double sumA = rows.values().stream().mapToDouble(JudgementSuite::pairs).sum();
        double sumB = cols.values().stream().mapToDouble(JudgementSuite::pairs).sum();
        double expected = sumA * sumB / pairs(n);
        double max = (sumA + sumB) / 2;
        if (max == expected) {
            return 1.0; // both labelings are all-in-one (or all singletons): identical partitions
        }
        return (index - expected) / (max - expected);
    }

    private static double pairs(long m) {
        return m * (m - 1) / 2.0;
    }

    // ---- the table -------------------------------------------------------------------------------------------

    private static final String FORMAT = "%-28s %-30s %-11s %3s %-22s %4s %6s %-5s %7s  %s";

    /** The table's header line. */
    public static String header() {
        return String.format(Locale.ROOT, FORMAT, "case", "expected", "verdict", "k", "sizes", "out", "ARI",
                "right", "seconds", "why wrong");
    }

    /** One table line. */
    public static String row(Outcome o) {
        Got g = o.got();
        return String.format(Locale.ROOT, FORMAT, o.c().name(), o.c().expected().label(),
                g == null ? "-" : g.verdict(), g == null ? "-" : String.valueOf(g.k()),
                g == null ? "-" : g.sizesText(), g == null ? "-" : String.valueOf(g.outliers().size()),
                Double.isNaN(o.ari()) ? "-" : String.format(Locale.ROOT, "%.2f", o.ari()).replace("-0.00", "0.00"),
                o.right() ? "yes" : "NO",
                Double.isNaN(o.seconds()) ? "-" : String.format(Locale.ROOT, "%.1f", o.seconds()), o.why())
                .stripTrailing();
    }

    /** The whole table with a closing count line. */
    public static String table(List<Outcome> outcomes) {
        var s = new StringBuilder(header()).append('\n');
        for (Outcome o : outcomes) {
            s.append(row(o)).append('\n');
        }
        long right = outcomes.stream().filter(Outcome::right).count();
        double total = outcomes.stream().mapToDouble(Outcome::seconds).filter(x -> !Double.isNaN(x)).sum();
        s.append(String.format(Locale.ROOT, "right in %d of %d cases; %.0f s of studies%n", right, outcomes.size(),
                total));
        return s.toString();
    }

    /** The table as Markdown (for README.md): case, accepted, verdict, k, sizes, outliers, ARI, right. */
    public static String markdown(List<Outcome> outcomes) {
        var s = new StringBuilder("| case | accepted | verdict | k | sizes | outliers | ARI | right |\n")
                .append("|---|---|---|---|---|---|---|---|\n");
        for (Outcome o : outcomes) {
            Got g = o.got();
            s.append("| ").append(o.c().name()).append(" | ").append(o.c().expected().label()).append(" | ")
                    .append(g == null ? "failed" : g.verdict()).append(" | ")
                    .append(g == null ? "" : String.valueOf(g.k())).append(" | ")
                    .append(g == null ? "" : g.sizesText()).append(" | ")
                    .append(g == null ? "" : String.valueOf(g.outliers().size())).append(" | ")
                    .append(Double.isNaN(o.ari()) ? "" : String.format(Locale.ROOT, "%.2f", o.ari())
                            .replace("-0.00", "0.00"))
                    .append(" | ").append(o.right() ? "yes" : "**no**").append(" |\n");
        }
        long right = outcomes.stream().filter(Outcome::right).count();
        s.append("\nRight in ").append(right).append(" of ").append(outcomes.size()).append(" cases.\n");
        return s.toString();
    }

    /** The cases and their accepted answers with reasons, as Markdown; cases that share an answer share a row. */
    public static String listing() {
        var s = new StringBuilder("| cases | input options | accepted | reason |\n|---|---|---|---|\n");
        List<Case> all = JudgementCases.all();
        for (int i = 0; i < all.size();) {
            Case c = all.get(i);
            int j = i + 1;
            while (j < all.size() && all.get(j).expected().equals(c.expected())
                    && all.get(j).options().equals(c.options())) {
                j++;
            }
            String names = all.subList(i, j).stream().map(Case::name).collect(Collectors.joining(", "));
            s.append("| ").append(names).append(" | ").append(String.join(" ", c.options())).append(" | ")
                    .append(c.expected().label()).append(" | ").append(c.expected().reason()).append(" |\n");
            i = j;
        }
        return s.toString();
    }

    static void deleteTree(Path p) throws IOException {
        if (!Files.exists(p)) {
            return;
        }
        try (var walk = Files.walk(p)) {
            for (Path q : walk.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(q);
            }
        }
    }

    /**
     * {@code JudgementSuite [--jar JAR] [--work DIR] [--only REGEX] [--draw D] [--table FILE] [--markdown FILE]
     * [--xmx SIZE] [--rejudge] [--list]}, run from the project directory; {@code --rejudge} judges the outputs of
     * the last run in the work directory again without running studies. Prints the table; exits 0 whether or not
     * cases are wrong (the table is the result), 1 if a study could not run.
     */
    public static void main(String[] args) throws Exception {
        Path jar = Path.of("target", "treeproof.jar");
        Path work = Path.of("target", "judgement");
        Path tableFile = null;
        Path markdownFile = null;
        Pattern only = null;
        String xmx = "3g";
        int draw = 0;
        boolean rejudge = false;
        for (int i = 0; i < args.length; i++) {
            switch (args[i]) {
                case "--jar" -> jar = Path.of(args[++i]);
                case "--work" -> work = Path.of(args[++i]);
                case "--only" -> only = Pattern.compile(args[++i]);
                case "--table" -> tableFile = Path.of(args[++i]);
                case "--markdown" -> markdownFile = Path.of(args[++i]);
                case "--xmx" -> xmx = args[++i];
                case "--draw" -> draw = Integer.parseInt(args[++i]);
                case "--rejudge" -> rejudge = true;
                case "--list" -> {
                    System.out.print(listing());
                    return;
                }
                default -> {
                    System.err.println("unknown argument: " + args[i]);
                    System.exit(2);
                }
            }
        }
        var suite = new JudgementSuite(jar, work, List.of("-Xmx" + xmx), draw);
        List<Outcome> outcomes;
        if (rejudge) {
            outcomes = suite.rejudge(only);
            System.out.print(table(outcomes));
        } else {
            System.out.println(header());
            outcomes = suite.run(only, System.out);
        }
        String table = table(outcomes);
        if (!rejudge) {
            System.out.print(table.substring(table.lastIndexOf("right in")));
        }
        if (tableFile != null) {
            Files.writeString(tableFile, table, StandardCharsets.UTF_8);
        }
        if (markdownFile != null) {
            Files.writeString(markdownFile, markdown(outcomes), StandardCharsets.UTF_8);
        }
        System.exit(outcomes.stream().anyMatch(o -> o.got() == null) ? 1 : 0);
    }

    private static Path dirOf(Case c, Path synthetic) {
        return switch (c.source()) {
            case OPEN -> OPEN_DIR.toAbsolutePath();
            case FIXED -> FIXED_DIR.toAbsolutePath();
            case SYNTHETIC -> synthetic;
        };
    }
}
