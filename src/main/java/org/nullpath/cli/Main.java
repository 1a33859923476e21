package org.nullpath.cli;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The {@code nullpath} command: dispatches to {@code plan} and {@code check}. */
@Command(name = "nullpath", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        subcommands = {PlanCommand.class, CheckCommand.class, SweepCommand.class, CommandLine.HelpCommand.class},
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

    /** Runs the command line and returns the exit code (used by tests). */
    public static int run(String... args) {
        CommandLine cl = new CommandLine(new Main());
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
        CommandLine cl = new CommandLine(this);
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
