package org.treeproof.cli;

import java.io.PrintStream;
import org.treeproof.data.InputException;
import org.treeproof.io.CheckpointFile;
import org.treeproof.io.DiskFull;

/**
 * What a study that stops early tells the user about the work it kept: on Ctrl-C (or SIGTERM) a line saying how
 * much finished work the checkpoint holds and that {@code --resume} continues it (the JVM then exits with 130, or
 * 143 for SIGTERM); on a full disk a one-line error saying the same, or that nothing was kept.
 */
final class KeptWork implements AutoCloseable {
    private final CheckpointFile checkpoint;
    private final String out;
    private final PrintStream err;
    private final Thread hook;
    private volatile boolean finished;

    /** Starts watching for an interrupt; {@link #close()} stops it once the results are in place. */
    KeptWork(CheckpointFile checkpoint, String out, PrintStream err) {
        this.checkpoint = checkpoint;
        this.out = out;
        this.err = err;
        this.hook = new Thread(this::interrupted, "treeproof-interrupt-notice");
        Runtime.getRuntime().addShutdownHook(hook);
    }

    private void interrupted() {
        if (finished) {
            return;
        }
        long kept = checkpoint.recordsKept();
        err.println("treeproof: interrupted; " + (kept == 0 ? "no replicate had finished yet, so there is nothing to "
                + "resume" : "the finished work (" + kept + " replicates, null and reference sets so far) is kept in "
                + checkpoint.location() + ": run the same command with --resume to continue"));
        err.flush();
    }

    /** The error for a disk that filled up while the study or its checkpoint was being written. */
    InputException diskFullDuringStudy() {
        long kept = checkpoint.recordsKept();
        if (kept == 0) {
            checkpoint.discard();
            return new InputException(DiskFull.NO_SPACE.toLowerCase(java.util.Locale.ROOT) + " while keeping the "
                    + "checkpoint beside --out " + out + "; nothing was kept and nothing written under " + out
                    + ": free some space and run the command again");
        }
        return new InputException(DiskFull.NO_SPACE.toLowerCase(java.util.Locale.ROOT) + " while keeping the "
                + "checkpoint beside --out " + out + "; nothing was written under " + out + ", and " + kept
                + " finished pieces of work are kept in " + checkpoint.location() + ": free some space and run the "
                + "same command with --resume");
    }

    /** The error for a disk that filled up while the results were written (the finished study is kept). */
    InputException diskFullDuringResults() {
        return new InputException(DiskFull.NO_SPACE.toLowerCase(java.util.Locale.ROOT) + " while writing the results"
                + " for --out " + out + "; nothing was written under " + out + ", and the finished study is kept in "
                + checkpoint.location() + ": free some space and run the same command with --resume to write them "
                + "without recomputing");
    }

    /** The study's results are in place: an interrupt from now on has nothing to report. */
    @Override
    public void close() {
        finished = true;
        try {
            Runtime.getRuntime().removeShutdownHook(hook);
        } catch (IllegalStateException shuttingDown) {
            // the hook runs now and sees finished
        }
    }
}
