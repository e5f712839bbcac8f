package org.treeproof.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The {@code treeproof} command: a parent for the sub-commands. */
@Command(name = "treeproof", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        description = "Hierarchical clustering with resampling evidence for the number of clusters.",
        subcommands = {CommandLine.HelpCommand.class})
public final class Main implements Runnable {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    public static void main(String[] args) {
        System.exit(run(args));
    }

    /** Runs the command line and returns the exit code (see {@link ExitCodes}). */
    public static int run(String... args) {
        return new CommandLine(new Main()).setExitCodeExceptionMapper(e -> ExitCodes.BAD_INPUT)
                .setParameterExceptionHandler(Main::onBadUsage).execute(args);
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
