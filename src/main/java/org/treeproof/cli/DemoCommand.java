package org.treeproof.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.LinkOption;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.Callable;
import org.treeproof.data.InputException;
import org.treeproof.io.OutputGuard;
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

    @Option(names = "--force", description = "Replace DIR if it exists and treeproof wrote it; also overwrite an "
            + "edited copy of the demo table in DIR-input.")
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
            throw new InputException("--data " + table + ": not a demo table; use yeast-batches.csv, "
                    + "single-strain-batches.csv or nested-strains.csv");
        }
        // every output condition first: nothing is unpacked for a run that cannot write its results
        OutputGuard.check(out, "--out", force, List.of());
        // The demo table is unpacked beside the output (kept, so that the report's input file can be opened).
        Path dir = out.toAbsolutePath().normalize().resolveSibling(out.toAbsolutePath().normalize().getFileName()
                + "-input");
        String[] names = {table, table.replace(".csv", "-truth.csv")};
        List<Path> unpacked = unpack(dir, names);
        Path data = dir.resolve(names[0]);
        Path labels = dir.resolve(names[1]);
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
        int code = Main.run(args.toArray(String[]::new));
        if (code != ExitCodes.OK) {
            // a failed demo leaves nothing it unpacked
            for (Path p : unpacked) {
                try {
                    Files.deleteIfExists(p);
                } catch (IOException keep) {
                    // a folder someone else put files in stays
                }
            }
        }
        return code;
    }

    /**
     * Writes the bundled tables into {@code dir}; returns what it created (files, and the folder if it was new).
     * A copy that already holds the bundled bytes is kept as it is; one that differs (edited by someone) is
     * overwritten only with --force.
     */
    private List<Path> unpack(Path dir, String[] names) throws IOException {
        String shown = "--out " + out + ": the demo's input folder " + dir;
        if (Files.exists(dir, LinkOption.NOFOLLOW_LINKS) && !Files.isDirectory(dir, LinkOption.NOFOLLOW_LINKS)) {
            throw new InputException(shown + " exists and is not a folder; move it away or choose another --out");
        }
        var bundled = new ArrayList<byte[]>();
        for (String name : names) {
            Path target = dir.resolve(name);
            byte[] bytes = bundled(name);
            bundled.add(bytes);
            if (Files.exists(target, LinkOption.NOFOLLOW_LINKS) && !force
                    && !(Files.isRegularFile(target, LinkOption.NOFOLLOW_LINKS)
                            && Arrays.equals(Files.readAllBytes(target), bytes))) {
                throw new InputException(shown + " holds " + name + ", which differs from the bundled table (edited?);"
                        + " it is kept. Choose another --out, or add --force to overwrite it");
            }
        }
        var created = new ArrayList<Path>();
        if (!Files.isDirectory(dir)) {
            try {
                Files.createDirectories(dir);
            } catch (IOException e) {
                throw new InputException(shown + ": cannot create it (" + OutputGuard.describe(e) + ")");
            }
            created.add(dir);
        }
        for (int i = 0; i < names.length; i++) {
            Path target = dir.resolve(names[i]);
            if (!Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
                created.add(0, target);
            } else if (Arrays.equals(Files.readAllBytes(target), bundled.get(i))) {
                continue;
            }
            Files.write(target, bundled.get(i));
        }
        return created;
    }

    private static String relative(Path cwd, Path p) {
        return p.startsWith(cwd) ? cwd.relativize(p).toString() : p.toString();
    }

    private static byte[] bundled(String name) {
        try (InputStream in = DemoCommand.class.getResourceAsStream("/org/treeproof/demo/" + name)) {
            if (in == null) {
                throw new IllegalStateException("the demo table " + name + " is missing from the jar");
            }
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
