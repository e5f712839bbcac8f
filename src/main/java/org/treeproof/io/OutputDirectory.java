package org.treeproof.io;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryNotEmptyException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.security.SecureRandom;
import java.util.Collection;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;
import org.treeproof.data.InputException;

/**
 * An output directory made atomically: everything is written into a hidden directory beside the target,
 * which is renamed to the target name only when complete. A run that fails or is killed never leaves a
 * half-written directory under the target name; an existing target is refused unless replacing is asked
 * for, and then it is swapped out only after the new one is complete. Every finished directory carries the
 * manifest {@link OutputGuard#MARKER} that lets a later {@code --force} recognise it as treeproof's own.
 */
public final class OutputDirectory implements AutoCloseable {
    private static final SecureRandom RANDOM = new SecureRandom();
    private final Path target;
    private final Path staging;
    private final boolean replace;
    private final List<Path> protect;
    private final Thread cleanup;
    private boolean committed;
    private int filesWritten;

    private OutputDirectory(Path target, Path staging, boolean replace, List<Path> protect) {
        this.target = target;
        this.staging = staging;
        this.replace = replace;
        this.protect = protect;
        this.cleanup = new Thread(() -> deleteQuietly(staging), "treeproof-cleanup");
        Runtime.getRuntime().addShutdownHook(cleanup);
    }

    /**
     * Starts writing {@code target}.
     *
     * @param option  the option that named the directory, for messages
     * @param replace whether an existing target may be replaced; only a directory treeproof wrote ever is (see
     *                {@link OutputGuard})
     * @param protect files the run reads; a directory holding any of them is never replaced
     * @throws InputException if the target may not be written or replaced, or its parent cannot be written
     */
    public static OutputDirectory begin(Path target, String option, boolean replace, Collection<Path> protect) {
        OutputGuard.check(target, option, replace, protect);
        Path abs = target.toAbsolutePath().normalize();
        Path parent = abs.getParent();
        try {
            Files.createDirectories(parent);
            // created like any directory (mode from the umask), unlike createTempDirectory's owner-only mode
            Path staging = null;
            for (int attempt = 0; staging == null; attempt++) {
                Path candidate = parent.resolve("." + abs.getFileName() + ".partial-"
                        + Long.toUnsignedString(RANDOM.nextLong(), 36));
                try {
                    staging = Files.createDirectory(candidate);
                } catch (FileAlreadyExistsException e) {
                    if (attempt > 100) {
                        throw e;
                    }
                }
            }
            return new OutputDirectory(abs, staging, replace, List.copyOf(protect));
        } catch (IOException e) {
            throw new InputException(option + " " + target + ": cannot write beside it (" + OutputGuard.describe(e)
                    + ")");
        }
    }

    /** As {@link #begin(Path, String, boolean, Collection)} with no input files to protect. */
    public static OutputDirectory begin(Path target, String option, boolean replace) {
        return begin(target, option, replace, List.of());
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
            DiskFull.beforeResultFile(filesWritten++);
            Files.write(file(relative), bytes);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + relative, e);
        }
    }

    /** Renames the finished directory to the target name, replacing an existing target if allowed. */
    public void commit() {
        try {
            Files.write(staging.resolve(OutputGuard.MARKER), OutputGuard.manifestOf(staging));
            if (Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
                if (!replace) {
                    throw new InputException(target + " appeared while the run was writing; nothing was replaced");
                }
                // checked again: the directory may have changed while the study ran
                OutputGuard.requireReplaceable(target, "--out " + target, protect);
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
