package org.baywright.cli;

import java.io.PrintWriter;
import org.baywright.calc.Caution;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The {@code baywright} command and its subcommands. */
@Command(
        name = "baywright",
        mixinStandardHelpOptions = true,
        versionProvider = BaywrightCommand.Version.class,
        description = {
            "Steel floor framing: size members as the lightest adequate section, with their own weight.",
            "",
            Caution.TEXT,
            ""
        },
        subcommands = {NewCommand.class, CheckCommand.class, DesignCommand.class, BeamCommand.class, CatalogCommand.class, StudyCommand.class,
            CommandLine.HelpCommand.class})
public final class BaywrightCommand implements Runnable {

    /** Exit code: everything sized and adequate. */
    public static final int EXIT_OK = 0;
    /** Exit code: some member is overstressed (or unsupported). */
    public static final int EXIT_OVERSTRESSED = 1;
    /** Exit code: bad input (the message names the problem). */
    public static final int EXIT_BAD_INPUT = 2;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** Runs the command line and returns the exit code; never throws. */
    public static int execute(String[] args) {
        return execute(args, new PrintWriter(System.out, true), new PrintWriter(System.err, true));
    }

    /** Runs the command line with the given streams (tests use this). */
    public static int execute(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new BaywrightCommand());
        cl.setOut(out);
        cl.setErr(err);
        cl.setExecutionExceptionHandler(new ErrorHandler());
        cl.setParameterExceptionHandler((ex, a) -> {
            err.println("baywright: " + ex.getMessage());
            err.println("Try '" + ex.getCommandLine().getCommandSpec().qualifiedName() + " --help'.");
            return EXIT_BAD_INPUT;
        });
        int code = cl.execute(args);
        out.flush();
        err.flush();
        return code;
    }

    /** Turns expected problems into one-line messages and exit codes instead of stack traces. */
    static final class ErrorHandler implements CommandLine.IExecutionExceptionHandler {
        @Override
        public int handleExecutionException(Exception ex, CommandLine cl, CommandLine.ParseResult pr) {
            PrintWriter err = cl.getErr();
            if (ex instanceof BadInputException || ex instanceof IllegalArgumentException) {
                err.println("baywright: " + ex.getMessage());
                return EXIT_BAD_INPUT;
            }
            err.println("baywright: internal error: " + ex);
            if (Boolean.getBoolean("baywright.debug")) {
                ex.printStackTrace(err);
            }
            return 3;
        }
    }

    /** Reads the version from the jar manifest. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String v = BaywrightCommand.class.getPackage().getImplementationVersion();
            return new String[] {"Baywright " + (v == null ? "(development build)" : v)};
        }
    }
}
