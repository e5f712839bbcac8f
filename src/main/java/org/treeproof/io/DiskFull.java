package org.treeproof.io;

import java.io.IOException;
import java.util.Locale;

/**
 * Recognises a write that failed because the disk (or the user's quota) is full, and, for fault-injection tests,
 * makes writes fail that way without filling a real disk.
 *
 * <p>On Linux and macOS the JDK reports ENOSPC as an {@link IOException} whose message is the C library's text
 * "No space left on device" (EDQUOT: "Disk quota exceeded"); that text is what is recognised. The system property
 * {@code treeproof.faultNoSpace} injects the same failure: {@code results} fails the second file written into the
 * output directory; {@code checkpoint:N} fails the checkpoint record after the N-th.
 */
public final class DiskFull {
    /** The text the C library gives for ENOSPC, and so the JDK's IOException message. */
    public static final String NO_SPACE = "No space left on device";
    private static final String QUOTA = "Disk quota exceeded";

    private DiskFull() {
    }

    /** Whether {@code t} or one of its causes is a write that failed for want of space. */
    public static boolean causedBy(Throwable t) {
        for (Throwable c = t; c != null; c = c.getCause()) {
            if (c instanceof IOException && c.getMessage() != null) {
                String m = c.getMessage().toLowerCase(Locale.ROOT);
                if (m.contains(NO_SPACE.toLowerCase(Locale.ROOT)) || m.contains(QUOTA.toLowerCase(Locale.ROOT))) {
                    return true;
                }
            }
            if (c.getCause() == c) {
                break;
            }
        }
        return false;
    }

    private static String fault() {
        return System.getProperty("treeproof.faultNoSpace", "");
    }

    /** Fault injection: fails the {@code index}-th (0-based) result file when asked to. */
    static void beforeResultFile(int index) throws IOException {
        if (fault().equals("results") && index >= 1) {
            throw new IOException(NO_SPACE + " (injected by treeproof.faultNoSpace)");
        }
    }

    /** Fault injection: fails a checkpoint record once {@code written} records are on disk when asked to. */
    static void beforeCheckpointRecord(long written) throws IOException {
        String f = fault();
        if (f.startsWith("checkpoint:") && written >= Long.parseLong(f.substring("checkpoint:".length()))) {
            throw new IOException(NO_SPACE + " (injected by treeproof.faultNoSpace)");
        }
    }
}
