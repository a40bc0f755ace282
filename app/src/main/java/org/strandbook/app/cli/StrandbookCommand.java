package org.strandbook.app.cli;

import java.io.PrintWriter;

import org.strandbook.app.bench.BenchCommand;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code strandbook} command line. Exit status: 0 success, 1 input rejected, 2 wrong usage.
 * Every subcommand is registered here, in one place.
 */
@Command(name = "strandbook",
        mixinStandardHelpOptions = true,
        versionProvider = StrandbookVersion.class,
        description = "Commissioning and maintenance workbook for the fiber-optic light paths of process spectrometers.",
        footer = {"", "Safety: fiber work exposes eyes to light sources and hands to glass shards, and optical power "
            + "in explosive atmospheres needs care; see the README's Safety section. Local codes and licensed "
            + "practice take precedence."},
        subcommands = {
            CommandLine.HelpCommand.class,
            DemoCommand.class,
            OpenCommand.class,
            FiberCommand.class,
            InitCommand.class,
            AcceptanceCommand.class,
            ImportScheduleCommand.class,
            ImportScansCommand.class,
            ScansCommand.class,
            ScanCommand.class,
            EvaluateCommand.class,
            TrendCommand.class,
            HistoryCommand.class,
            InspectCommand.class,
            MaintainCommand.class,
            NoteCommand.class,
            WithdrawCommand.class,
            SignCommand.class,
            AuditCommand.class,
            ExportCommand.class,
            SyncCommand.class,
            CloneCommand.class,
            FleetCommand.class,
            BenchCommand.class,
        })
public final class StrandbookCommand implements Runnable {

    public static final int EXIT_OK = 0;
    public static final int EXIT_REJECTED = 1;
    public static final int EXIT_USAGE = 2;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** Runs the command line with the process's standard streams. */
    public static int run(String... args) {
        return newCommandLine(new PrintWriter(System.out, true), new PrintWriter(System.err, true)).execute(args);
    }

    /** A configured command line writing to the given streams; tests call this. */
    public static CommandLine newCommandLine(PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new StrandbookCommand());
        cl.setOut(out);
        cl.setErr(err);
        cl.setExitCodeExceptionMapper(ex -> ex instanceof CommandLine.ParameterException ? EXIT_USAGE : EXIT_REJECTED);
        cl.setParameterExceptionHandler((ex, args) -> {
            ex.getCommandLine().getErr().println("strandbook: " + ex.getMessage());
            ex.getCommandLine().getErr().println("Try '" + ex.getCommandLine().getCommandSpec().qualifiedName() + " --help'.");
            return EXIT_USAGE;
        });
        cl.setExecutionExceptionHandler((ex, commandLine, parseResult) -> {
            commandLine.getErr().println("strandbook: " + messageOf(ex));
            return ex instanceof UsageProblem ? EXIT_USAGE : EXIT_REJECTED;
        });
        return cl;
    }

    private static String messageOf(Throwable ex) {
        String m = ex.getMessage();
        return m == null || m.isBlank() ? ex.getClass().getSimpleName() : m;
    }
}
