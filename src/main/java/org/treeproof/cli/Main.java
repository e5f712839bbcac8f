package org.treeproof.cli;

import org.treeproof.data.InputException;
import org.treeproof.study.NotEnoughMemoryException;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The {@code treeproof} command: a parent for the sub-commands. */
@Command(name = "treeproof", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        description = "Hierarchical clustering with resampling evidence for the number of clusters.",
        subcommands = {TreeCommand.class, AssessCommand.class, DemoCommand.class, CommandLine.HelpCommand.class})
public final class Main implements Runnable {

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
        return new CommandLine(new Main()).setParameterExceptionHandler(Main::onBadUsage)
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
        e.getCommandLine().getErr().println("treeproof: " + e.getMessage()
                + " (see 'treeproof " + e.getCommandLine().getCommandName() + " --help')");
        return ExitCodes.BAD_INPUT;
    }

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
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
