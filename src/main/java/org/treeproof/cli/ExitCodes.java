package org.treeproof.cli;

/** The process exit codes; scripts depend on them. */
public final class ExitCodes {
    /** The command did what was asked. */
    public static final int OK = 0;
    /** An internal fault (a bug): reported with a short message. */
    public static final int INTERNAL = 1;
    /** Bad usage or bad input: one line on stderr naming the file, line and column or the option. */
    public static final int BAD_INPUT = 2;
    /** Not enough memory for the requested size, said before allocating. */
    public static final int NOT_ENOUGH_MEMORY = 3;

    private ExitCodes() {
    }
}
