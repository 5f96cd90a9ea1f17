package org.baywright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.AccessDeniedException;
import java.nio.file.DirectoryNotEmptyException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.nio.file.NotDirectoryException;
import java.util.Arrays;
import org.baywright.calc.Caution;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

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
        subcommands = {NewCommand.class, CheckCommand.class, DesignCommand.class, BeamCommand.class, BayCommand.class, CatalogCommand.class, StudyCommand.class,
            CommandLine.HelpCommand.class})
public final class BaywrightCommand implements Runnable {

    /** Exit code: everything sized and adequate. */
    public static final int EXIT_OK = 0;
    /** Exit code: some member is overstressed (or unsupported). */
    public static final int EXIT_OVERSTRESSED = 1;
    /** Exit code: bad input (the message names the problem). */
    public static final int EXIT_BAD_INPUT = 2;
    /** Exit code: a fault of Baywright itself (a bug: please report it, with the output of {@code --debug}). */
    public static final int EXIT_INTERNAL = 3;
    /** The option that shows the stack trace of an internal error; also the system property {@code baywright.debug}. */
    public static final String DEBUG = "--debug";

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Option(names = DEBUG, scope = CommandLine.ScopeType.INHERIT,
            description = "After an error message, also print the stack trace (for a bug report).")
    boolean debug;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** Runs the command line and returns the exit code; never throws. */
    public static int execute(String[] args) {
        return execute(args, new PrintWriter(System.out, true), new PrintWriter(System.err, true));
    }

    /** Runs the command line with the given streams (tests use this); never throws. */
    public static int execute(String[] args, PrintWriter out, PrintWriter err) {
        int code;
        try {
            CommandLine cl = new CommandLine(new BaywrightCommand());
            cl.setOut(out);
            cl.setErr(err);
            cl.setExecutionExceptionHandler(new ErrorHandler());
            cl.setParameterExceptionHandler((ex, a) -> {
                err.println("baywright: " + ProblemLines.oneLine(String.valueOf(ex.getMessage())));
                err.println("Try '" + ex.getCommandLine().getCommandSpec().qualifiedName() + " --help'.");
                return EXIT_BAD_INPUT;
            });
            code = cl.execute(args);
        } catch (RuntimeException | StackOverflowError | OutOfMemoryError e) {
            // what picocli does not hand to the handler (errors, or a fault while reporting one)
            code = internalError(e, err, Arrays.asList(args).contains(DEBUG) || Boolean.getBoolean("baywright.debug"));
        }
        out.flush();
        err.flush();
        return code;
    }

    /**
     * Reports a fault of Baywright: one line, and the stack trace only when asked for.
     *
     * @return {@link #EXIT_INTERNAL}
     */
    public static int internalError(Throwable e, PrintWriter err, boolean debug) {
        String what = e instanceof OutOfMemoryError ? "ran out of memory (is the plan unusually large? try java -Xmx4g)"
                : e instanceof StackOverflowError ? "ran out of stack" : e.toString();
        err.println("baywright: internal error: " + ProblemLines.oneLine(what) + (debug ? ""
                : "; please report it, with the output of the same command run with " + DEBUG));
        if (debug) {
            e.printStackTrace(err);
        }
        err.flush();
        return EXIT_INTERNAL;
    }

    /** A file that cannot be read or written, as a readable sentence naming it. */
    static String describe(IOException e) {
        if (e instanceof FileSystemException f && f.getFile() != null) {
            String reason = e instanceof NoSuchFileException ? "no such file or folder"
                    : e instanceof AccessDeniedException ? "permission denied"
                    : e instanceof FileAlreadyExistsException ? "already exists"
                    : e instanceof NotDirectoryException ? "is not a folder"
                    : e instanceof DirectoryNotEmptyException ? "is a folder that is not empty"
                    : f.getReason() != null ? f.getReason() : e.getClass().getSimpleName();
            return f.getFile() + (f.getOtherFile() == null ? "" : " → " + f.getOtherFile()) + ": " + reason;
        }
        return e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
    }

    /**
     * Turns expected problems into one-line messages and exit codes instead of stack traces: bad input
     * and files that cannot be read or written exit with {@link #EXIT_BAD_INPUT}; anything else is a
     * fault of Baywright ({@link #EXIT_INTERNAL}), with its stack trace under {@code --debug}.
     */
    public static final class ErrorHandler implements CommandLine.IExecutionExceptionHandler {
        @Override
        public int handleExecutionException(Exception ex, CommandLine cl, CommandLine.ParseResult pr) {
            PrintWriter err = cl.getErr();
            boolean debug = debug(pr);
            if (ex instanceof BadInputException || ex instanceof IllegalArgumentException) {
                // the message is Baywright's own (a catalog's problems come one per indented line)
                err.println("baywright: " + ex.getMessage());
            } else if (ex instanceof IOException io) {
                err.println("baywright: " + ProblemLines.oneLine(describe(io)));
            } else {
                return internalError(ex, err, debug);
            }
            if (debug) {
                ex.printStackTrace(err);
            }
            return EXIT_BAD_INPUT;
        }

        /** True when {@code --debug} was given to the command or any subcommand, or {@code -Dbaywright.debug} is set. */
        static boolean debug(CommandLine.ParseResult pr) {
            for (CommandLine.ParseResult r = pr; r != null; r = r.subcommand()) {
                if (r.hasMatchedOption(DEBUG)) {
                    return true;
                }
            }
            return Boolean.getBoolean("baywright.debug");
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
