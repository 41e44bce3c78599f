package org.branchsim.cli;

import java.io.PrintWriter;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.branchsim.core.error.BranchsimException;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code branchsim} command: simulates hydraulic circuits with a pressure-reducing branch. Exit codes:
 * 0 success, 1 simulation failed, 2 bad input or usage.
 */
@Command(name = "branchsim", mixinStandardHelpOptions = true, version = "branchsim 0.1.0",
        description = "Time-domain simulation of hydraulic circuits with a pressure-reducing branch.",
        footer = {"", "Exit codes: 0 success, 1 simulation failed, 2 bad input or usage.",
            "Caution: " + Cautions.SHORT})
public final class BranchsimMain implements Runnable {

    /** The subcommands, in the order the help lists them. */
    private static final List<Class<?>> COMMANDS = List.of(RunCommand.class, CheckCommand.class, SweepCommand.class,
            ModesCommand.class, CharacteristicCommand.class, DiagnoseCommand.class, DiagramCommand.class,
            CompareCommand.class, FitCommand.class, TuneCommand.class, ToleranceCommand.class, MergeCommand.class,
            TimingCommand.class, SchemaCommand.class, CommandLine.HelpCommand.class);

    /**
     * Each subcommand under its name and its aliases, as its {@code @Command} annotation gives them. Only the one
     * named on the command line is built (picocli reads each command's annotations when it is added, a third of a
     * second for all of them at start-up); all are built for the top-level help and for an unknown name.
     */
    static final Map<String, Class<?>> SUBCOMMANDS = subcommands();

    private static Map<String, Class<?>> subcommands() {
        Map<String, Class<?>> m = new LinkedHashMap<>();
        for (Class<?> c : COMMANDS) {
            Command command = c.getAnnotation(Command.class);
            m.put(command.name(), c);
            for (String alias : command.aliases()) {
                m.put(alias, c);
            }
        }
        return Collections.unmodifiableMap(m);
    }

    /** Exit code of a successful run. */
    public static final int OK = 0;
    /** Exit code when the simulation fails. */
    public static final int SIMULATION_FAILED = 1;
    /** Exit code for bad input or usage. */
    public static final int BAD_INPUT = 2;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        throw new CommandLine.ParameterException(spec.commandLine(), "a command is needed (run, check, sweep, tolerance, merge, modes, diagnose, timing)");
    }

    /**
     * @param args the command line
     * @return the command line with the subcommand it names (all subcommands for the top-level help, "help" or an
     *         unknown name; none for the version alone)
     */
    static CommandLine commandLine(String... args) {
        CommandLine cl = new CommandLine(new BranchsimMain());
        Class<?> only = args.length > 0 && !"help".equals(args[0]) ? SUBCOMMANDS.get(args[0]) : null;
        boolean versionOnly = args.length == 1 && (args[0].equals("--version") || args[0].equals("-V"));
        if (only != null) {
            cl.addSubcommand(only);
        } else if (!versionOnly) {
            COMMANDS.forEach(cl::addSubcommand);
        }
        return cl;
    }

    /** Entry point. */
    public static void main(String[] args) {
        System.exit(execute(new PrintWriter(System.out, true), new PrintWriter(System.err, true), args));
    }

    /**
     * Runs the command line with the given output streams; never throws.
     *
     * @return the exit code
     */
    public static int execute(PrintWriter out, PrintWriter err, String... args) {
        CommandLine cl = commandLine(args);
        cl.setOut(out);
        cl.setErr(err);
        cl.setExitCodeExceptionMapper(e -> e instanceof BranchsimException b && !b.key().isInputError()
                ? SIMULATION_FAILED : BAD_INPUT);
        cl.setParameterExceptionHandler((ex, a) -> {
            CommandLine c = ex.getCommandLine();
            c.getErr().println("error: " + ex.getMessage());
            c.getErr().println("see '" + c.getCommandSpec().qualifiedName() + " --help'");
            return BAD_INPUT;
        });
        cl.setExecutionExceptionHandler((ex, c, parse) -> {
            if (ex instanceof BranchsimException b) {
                c.getErr().println("error: " + b.fullReport());
                return b.key().isInputError() ? BAD_INPUT : SIMULATION_FAILED;
            }
            c.getErr().println("internal error (please report with the command and scenario): "
                    + (ex.getMessage() == null ? ex.getClass().getSimpleName() : ex.getMessage()));
            return SIMULATION_FAILED;
        });
        if (args.length > 0 && !args[0].startsWith("-") && !cl.getSubcommands().containsKey(args[0])) {
            // checked here because picocli prints the main help for "UNKNOWN --help" and exits 0
            err.println("error: unknown command \"" + args[0] + "\"; expected one of "
                    + String.join(", ", cl.getSubcommands().keySet()));
            err.println("see 'branchsim --help'");
            err.flush();
            return BAD_INPUT;
        }
        int code;
        try {
            code = cl.execute(args);
        } catch (OutOfMemoryError e) {
            err.println("error: out of memory; give Java more memory (java -Xmx...), use fewer --threads, "
                    + "or coarsen outputInterval");
            code = SIMULATION_FAILED;
        } catch (StackOverflowError e) {
            err.println("internal error: stack overflow (please report with the scenario)");
            code = SIMULATION_FAILED;
        }
        out.flush();
        err.flush();
        return code;
    }
}
