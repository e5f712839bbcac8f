package org.treeproof.io;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryNotEmptyException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Comparator;
import java.util.stream.Stream;
import org.treeproof.data.InputException;

/**
 * An output directory made atomically: everything is written into a hidden directory beside the target,
 * which is renamed to the target name only when complete. A run that fails or is killed never leaves a
 * half-written directory under the target name; an existing target is refused unless replacing is asked
 * for, and then it is swapped out only after the new one is complete.
 */
public final class OutputDirectory implements AutoCloseable {
    private final Path target;
    private final Path staging;
    private final boolean replace;
    private final Thread cleanup;
    private boolean committed;

    private OutputDirectory(Path target, Path staging, boolean replace) {
        this.target = target;
        this.staging = staging;
        this.replace = replace;
        this.cleanup = new Thread(() -> deleteQuietly(staging), "treeproof-cleanup");
        Runtime.getRuntime().addShutdownHook(cleanup);
    }

    /**
     * Starts writing {@code target}.
     *
     * @param option  the option that named the directory, for messages
     * @param replace whether an existing target may be replaced
     * @throws InputException if the target exists and may not be replaced, or its parent cannot be written
     */
    public static OutputDirectory begin(Path target, String option, boolean replace) {
        Path abs = target.toAbsolutePath().normalize();
        if (Files.exists(abs) && !replace) {
            throw new InputException(option + " " + target + ": already exists; choose another directory or add --force");
        }
        if (Files.exists(abs) && !Files.isDirectory(abs)) {
            throw new InputException(option + " " + target + ": exists and is not a directory");
        }
        Path parent = abs.getParent();
        try {
            Files.createDirectories(parent);
            Path staging = Files.createTempDirectory(parent, "." + abs.getFileName() + ".partial-");
            return new OutputDirectory(abs, staging, replace);
        } catch (IOException e) {
            throw new InputException(option + " " + target + ": cannot write beside it (" + e.getMessage() + ")");
        }
    }

    /** Whether something already exists under {@code target}. */
    public static boolean exists(Path target) {
        return Files.exists(target);
    }

    /** Where to write files now; becomes the target on {@link #commit()}. */
    public Path staging() {
        return staging;
    }

    /** A file inside the staging directory; sub-directories are created. */
    public Path file(String relative) {
        Path p = staging.resolve(relative).normalize();
        if (!p.startsWith(staging)) {
            throw new IllegalArgumentException("output file outside the output directory: " + relative);
        }
        try {
            Files.createDirectories(p.getParent());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return p;
    }

    /** Writes bytes to a file inside the staging directory. */
    public void write(String relative, byte[] bytes) {
        try {
            Files.write(file(relative), bytes);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + relative, e);
        }
    }

    /** Renames the finished directory to the target name, replacing an existing target if allowed. */
    public void commit() {
        try {
            if (Files.exists(target)) {
                if (!replace) {
                    throw new InputException(target + " appeared while the run was writing; nothing was replaced");
                }
                Path old = Files.createTempDirectory(target.getParent(), "." + target.getFileName() + ".old-");
                Files.delete(old);
                move(target, old);
                move(staging, target);
                deleteQuietly(old);
            } else {
                move(staging, target);
            }
            committed = true;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot move the finished output into " + target, e);
        }
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException | FileAlreadyExistsException | DirectoryNotEmptyException e) {
            throw new IOException("cannot rename " + from + " to " + to + " atomically: " + e.getMessage(), e);
        }
    }

    /** Removes the staging directory unless it was committed. */
    @Override
    public void close() {
        if (!committed) {
            deleteQuietly(staging);
        }
        try {
            Runtime.getRuntime().removeShutdownHook(cleanup);
        } catch (IllegalStateException shuttingDown) {
            // the hook itself runs now
        }
    }

    static void deleteQuietly(Path dir) {
        if (!Files.exists(dir)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(dir)) {
            walk.sorted(Comparator.reverseOrder()).forEach(p -> {
                try {
                    Files.deleteIfExists(p);
                } catch (IOException ignored) {
                    // best effort: a leftover hidden staging directory is harmless
                }
            });
        } catch (IOException ignored) {
            // best effort
        }
    }
}
