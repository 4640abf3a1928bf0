package org.gyreplan.app.cli;

import org.gyreplan.app.pipeline.Version;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code gyreplan} command (main class of the launcher script). Subcommands: {@code run}, {@code inspect},
 * {@code verify}, {@code desktop}. Exit status 0 on success, non-zero with a one-line reason otherwise.
 */
@Command(name = "gyreplan", mixinStandardHelpOptions = true, versionProvider = GyreplanCommand.VersionProvider.class,
        description = {"Wind-driven upper ocean: winds → stress, Ekman transport and pumping, coastal upwelling",
                "indices, Sverdrup/Stommel/Munk gyre on your basin → upwelling zones, mooring sites, survey plan.",
                "Not for navigation."},
        subcommands = {RunCommand.class, InspectCommand.class, VerifyCommand.class, DesktopCommand.class,
                CommandLine.HelpCommand.class})
public final class GyreplanCommand implements Runnable {

    /** Exit status when the input (scenario or data file) cannot be used. */
    public static final int EXIT_INPUT = 3;
    /** Exit status when a run was cancelled (Ctrl-C). */
    public static final int EXIT_CANCELLED = 130;
    /** Exit status when verification cases fail. */
    public static final int EXIT_VERIFY_FAILED = 4;

    @CommandLine.Spec CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** Builds the command line with the project's settings (used by {@link #main} and the tests). */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new GyreplanCommand());
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        cl.setExecutionExceptionHandler((ex, cmd, parsed) -> {
            cmd.getErr().println("gyreplan: " + oneLine(ex));
            return 1;
        });
        return cl;
    }

    static String oneLine(Throwable t) {
        String m = t.getMessage();
        if (m == null || m.isBlank()) m = t.getClass().getSimpleName();
        return m.replace('\n', ' ');
    }

    public static void main(String[] args) {
        // the SQLite driver (GeoPackage output) logs through SLF4J; without a logging back end SLF4J prints a
        // three-line notice on every run, which is noise on a command line
        if (System.getProperty("slf4j.internal.verbosity") == null) System.setProperty("slf4j.internal.verbosity", "ERROR");
        System.exit(commandLine().execute(args));
    }

    static final class VersionProvider implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"gyreplan " + Version.current(), "Java " + System.getProperty("java.version")};
        }
    }
}
