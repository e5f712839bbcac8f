package org.treeproof.cli;

import org.treeproof.data.InputException;
import org.treeproof.study.NotEnoughMemoryException;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The {@code treeproof} command: a parent for the sub-commands. */
@Command(name = "treeproof", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        description = "Hierarchical clustering with resampling evidence for the number of clusters.",
        subcommands = {TreeCommand.class, AssessCommand.class, DemoCommand.class, CommandLine.HelpCommand.class})
public final class Main implements java.util.concurrent.Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    public static void main(String[] args) {
        int code;
        try {
            code = run(args);
        } catch (OutOfMemoryError e) {
            System.err.println("treeproof: ran out of memory; give Java more heap (java -Xmx...), lower --threads, "
                    + "or reduce the input with --top-variable");
            code = ExitCodes.NOT_ENOUGH_MEMORY;
        }
        System.out.flush();
        System.exit(code);
    }

    /** Runs the command line and returns the exit code (see {@link ExitCodes}). */
    public static int run(String... args) {
        return new CommandLine(new Main()).registerConverter(Integer.class, Main::wholeNumber)
                .setParameterExceptionHandler(Main::onBadUsage)
                .setExecutionExceptionHandler(Main::onFailure).execute(args);
    }

    /**
     * Turns a failure into one line on stderr and an exit code: the user's problem (bad input, bad option)
     * is 2, not enough memory is 3, anything else is an internal fault (1), reported without a stack trace
     * unless TREEPROOF_DEBUG is set.
     */
    private static int onFailure(Exception e, CommandLine cmd, CommandLine.ParseResult parsed) {
        var err = cmd.getErr();
        if (e instanceof InputException) {
            err.println("treeproof: " + e.getMessage());
            return ExitCodes.BAD_INPUT;
        }
        if (org.treeproof.io.DiskFull.causedBy(e)) {
            err.println("treeproof: no space left on device; free some space and run the command again (" + e.getMessage()
                    + ")");
            return ExitCodes.BAD_INPUT;
        }
        if (e instanceof NotEnoughMemoryException) {
            err.println("treeproof: " + e.getMessage());
            return ExitCodes.NOT_ENOUGH_MEMORY;
        }
        err.println("treeproof: internal error: " + e + " (please report it; set TREEPROOF_DEBUG=1 for details)");
        if (System.getenv("TREEPROOF_DEBUG") != null) {
            e.printStackTrace(err);
        }
        return ExitCodes.INTERNAL;
    }

    private static int onBadUsage(CommandLine.ParameterException e, String[] args) {
        String message = e.getMessage();
        if (message.contains(OUT_OF_RANGE) && e.getArgSpec() instanceof CommandLine.Model.OptionSpec o) {
            String range = StudyOptions.rangeOf(o.longestName());
            message = "Invalid value for option '" + o.longestName() + "': '" + e.getValue() + "' is " + (range == null
                    ? "too large (at most " + Integer.MAX_VALUE + ")" : "out of range; " + range);
        }
        e.getCommandLine().getErr().println("treeproof: " + message
                + " (see '" + e.getCommandLine().getCommandSpec().qualifiedName() + " --help')");
        return ExitCodes.BAD_INPUT;
    }

    private static final String OUT_OF_RANGE = "is out of the range of whole numbers";

    /** A whole number; one beyond int's range is said to be out of range (the option's own range is added). */
    private static Integer wholeNumber(String value) {
        String v = value.strip();
        try {
            return Integer.valueOf(v);
        } catch (NumberFormatException e) {
            try {
                new java.math.BigInteger(v);
            } catch (NumberFormatException notWhole) {
                throw new CommandLine.TypeConversionException("'" + value + "' is not a whole number");
            }
            throw new CommandLine.TypeConversionException("'" + value + "' " + OUT_OF_RANGE);
        }
    }

    /** Without a command: the usage on stderr and exit 2, since nothing was done. */
    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getErr());
        return ExitCodes.BAD_INPUT;
    }

    /** The version from the jar's manifest, or "dev" when run from classes. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"treeproof " + toolVersion()};
        }
    }

    /** The tool's version as written in the jar manifest. */
    public static String toolVersion() {
        String v = Main.class.getPackage().getImplementationVersion();
        return v == null ? "dev" : v;
    }
}
