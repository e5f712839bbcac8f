package org.treeproof.io;

import org.treeproof.cli.InputOptions;
import picocli.CommandLine;

/** A command holding only the input options, so tests can parse them as the command line does. */
@CommandLine.Command(name = "probe")
final class OptionsProbe {
    @CommandLine.Mixin
    InputOptions input;

    /** Parses whitespace-separated arguments; throws picocli's ParameterException as the command line would. */
    static InputOptions parse(String args) {
        OptionsProbe probe = new OptionsProbe();
        String trimmed = args.strip();
        new CommandLine(probe).parseArgs(trimmed.isEmpty() ? new String[0] : trimmed.split("\\s+"));
        return probe.input;
    }
}
