package org.treeproof.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code treeproof demo}: runs {@code assess} on the bundled demo table (invented fermentation aroma profiles
 * with three planted yeast strains, see demo-data/README.md) and prints where the report is.
 */
@Command(name = "demo", mixinStandardHelpOptions = true,
        description = "Run assess on the bundled demo data (180 invented fermentation batches, three planted yeast "
                + "strains) and print where the report is.")
final class DemoCommand implements Callable<Integer> {
    static final String TABLE = "yeast-batches.csv";

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "treeproof-demo",
            description = "Output directory (default: ${DEFAULT-VALUE}).")
    Path out;

    @Option(names = "--data", paramLabel = "NAME", defaultValue = TABLE,
            description = "Which demo table: yeast-batches.csv (planted), single-strain-batches.csv (no structure) or "
                    + "nested-strains.csv (two levels). Default: ${DEFAULT-VALUE}.")
    String table;

    @Option(names = "--force", description = "Replace DIR if it exists.")
    boolean force;

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads (default: all cores).")
    Integer threads;

    @Option(names = "--no-progress", description = "Do not show progress.")
    boolean noProgress;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        if (!List.of("yeast-batches.csv", "single-strain-batches.csv", "nested-strains.csv").contains(table)) {
            throw new org.treeproof.data.InputException("--data " + table + ": not a demo table; use yeast-batches.csv, "
                    + "single-strain-batches.csv or nested-strains.csv");
        }
        // The demo table is unpacked beside the output (kept, so that the report's input file can be opened).
        Path dir = out.toAbsolutePath().normalize().resolveSibling(out.getFileName() + "-input");
        Files.createDirectories(dir);
        Path data = copy(table, dir);
        Path labels = copy(table.replace(".csv", "-truth.csv"), dir);
        Path cwd = Path.of("").toAbsolutePath();
        var args = new ArrayList<>(List.of("assess", relative(cwd, data), "--log2", "--out", out.toString(),
                "--labels", relative(cwd, labels)));
        if (force) {
            args.add("--force");
        }
        if (threads != null) {
            args.add("--threads");
            args.add(threads.toString());
        }
        if (noProgress) {
            args.add("--no-progress");
        }
        System.out.println("treeproof demo: assessing the bundled table " + table + " (invented data; see "
                + "demo-data/README.md)");
        return Main.run(args.toArray(String[]::new));
    }

    private static String relative(Path cwd, Path p) {
        return p.startsWith(cwd) ? cwd.relativize(p).toString() : p.toString();
    }

    private static Path copy(String name, Path dir) {
        try (InputStream in = DemoCommand.class.getResourceAsStream("/org/treeproof/demo/" + name)) {
            if (in == null) {
                throw new IllegalStateException("the demo table " + name + " is missing from the jar");
            }
            Path target = dir.resolve(name);
            Files.copy(in, target, StandardCopyOption.REPLACE_EXISTING);
            return target;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
