package org.treeproof.cli;

import java.io.PrintStream;
import java.util.Locale;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;
import org.treeproof.study.StudyProgress;

/**
 * Shows a study's progress: a progress bar on a terminal, and one plain line every few seconds when
 * standard error is a file or pipe (logs stay readable), or nothing at all.
 */
final class ProgressReporter implements StudyProgress, AutoCloseable {
    private static final long LINE_EVERY_NANOS = 5_000_000_000L;

    private final PrintStream err;
    private final boolean terminal;
    private final boolean silent;
    private ProgressBar bar;
    private String stage;
    private int total;
    private int done;
    private long lastLine;
    private final long start = System.nanoTime();

    ProgressReporter(PrintStream err, boolean silent) {
        this.err = err;
        this.silent = silent;
        this.terminal = System.console() != null && System.getenv("TERM") != null && !"dumb".equals(System.getenv("TERM"));
    }

    @Override
    public void stage(String name, int steps) {
        if (silent) {
            return;
        }
        closeBar();
        stage = name;
        total = steps;
        done = 0;
        if (terminal) {
            bar = new ProgressBarBuilder().setTaskName(name).setInitialMax(steps).setStyle(ProgressBarStyle.ASCII)
                    .setConsumer(new me.tongfei.progressbar.ConsoleProgressBarConsumer(err)).setUpdateIntervalMillis(250)
                    .build();
        } else {
            line();
        }
    }

    @Override
    public void step() {
        if (silent) {
            return;
        }
        done++;
        if (bar != null) {
            bar.step();
        } else if (System.nanoTime() - lastLine >= LINE_EVERY_NANOS || done == total) {
            line();
        }
    }

    private void line() {
        lastLine = System.nanoTime();
        err.printf(Locale.ROOT, "treeproof: [%5.0fs] %s: %d/%d%n", (lastLine - start) / 1e9, stage, done, total);
    }

    private void closeBar() {
        if (bar != null) {
            bar.close();
            bar = null;
        }
    }

    @Override
    public void close() {
        closeBar();
    }
}
