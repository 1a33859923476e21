package org.nullpath.cli;

import java.io.IOException;
import java.io.InputStream;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Properties;
import java.util.function.Supplier;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** The {@code nullpath} command: dispatches to {@code plan}, {@code check} and {@code sweep}. */
@Command(name = "nullpath", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        description = {
            "Signal timing, Doppler, horizons and link budgets for craft that accelerate for long periods.",
            "Exit codes: 0 done, 2 the input is wrong, 1 anything else."})
public final class Main implements java.util.concurrent.Callable<Integer> {

    /** Exit code for wrong input (scenario errors, bad options). */
    public static final int INPUT_ERROR = 2;
    /** Exit code for any other failure. */
    public static final int FAILURE = 1;

    public static void main(String[] args) {
        System.exit(run(args));
    }

    /**
     * The subcommands, in the order the usage lists them. picocli reads a command's annotations (by reflection,
     * into a model of its options) when the command is added, which takes tens of milliseconds for each before
     * anything runs; so a command line that names one of these gets only that one (and "help" after them).
     */
    private static final Map<String, Supplier<Object>> SUBCOMMANDS = new LinkedHashMap<>();

    static {
        SUBCOMMANDS.put("plan", PlanCommand::new);
        SUBCOMMANDS.put("check", CheckCommand::new);
        SUBCOMMANDS.put("sweep", SweepCommand::new);
    }

    @Spec
    private CommandSpec spec;

    /** Runs the command line and returns the exit code (used by tests). */
    public static int run(String... args) {
        CommandLine cl = new CommandLine(new Main());
        Supplier<Object> named = args.length > 0 ? SUBCOMMANDS.get(args[0]) : null;
        if (named != null) {
            cl.addSubcommand(args[0], named.get());
        } else {
            SUBCOMMANDS.forEach((name, command) -> cl.addSubcommand(name, command.get()));
            cl.addSubcommand("help", new CommandLine.HelpCommand());
        }
        cl.setParameterExceptionHandler((ex, a) -> {
            ex.getCommandLine().getErr().println("nullpath: " + ex.getMessage());
            ex.getCommandLine().getErr().println("(see: " + ex.getCommandLine().getCommandSpec().qualifiedName()
                    + " --help)");
            return INPUT_ERROR;
        });
        cl.setExecutionExceptionHandler((ex, c, p) -> {
            c.getErr().println("nullpath: error: " + ex);
            return FAILURE;
        });
        return cl.execute(args);
    }

    /** No command given: say what there is, on standard error, as a usage error. */
    @Override
    public Integer call() {
        CommandLine cl = spec.commandLine();
        cl.usage(cl.getErr());
        return INPUT_ERROR;
    }

    /** Reads the version Maven wrote into the jar's resources. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() throws IOException {
            Properties p = new Properties();
            try (InputStream in = Main.class.getResourceAsStream("/nullpath-version.properties")) {
                if (in != null) {
                    p.load(in);
                }
            }
            return new String[] {"nullpath " + p.getProperty("version", "unknown")};
        }
    }
}
