package org.gyreplan.app.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import java.nio.file.Path;
import java.util.concurrent.Callable;

/**
 * {@code gyreplan desktop [scenario]}: starts the desktop app. The app's launcher is loaded by name so that the
 * command line never links against JavaFX (an architecture test keeps it so).
 */
@Command(name = "desktop", mixinStandardHelpOptions = true,
        description = {"Start the desktop app (needs a display), optionally opening a scenario."},
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:the app was closed normally", "1:the desktop app is not available or could not start"})
public final class DesktopCommand implements Callable<Integer> {

    /** Fully qualified name of the desktop launcher (a class with {@code public static void main(String[])}). */
    static final String LAUNCHER = "org.gyreplan.app.desktop.DesktopLauncher";

    @Parameters(index = "0", arity = "0..1", paramLabel = "<scenario>", description = "scenario file to open")
    Path scenario;

    @CommandLine.Spec CommandLine.Model.CommandSpec spec;

    String launcherName = LAUNCHER;

    @Override
    public Integer call() {
        Method main;
        try {
            Class<?> c = Class.forName(launcherName, false, DesktopCommand.class.getClassLoader());
            main = c.getMethod("main", String[].class);
        } catch (ClassNotFoundException | NoSuchMethodException | LinkageError e) {
            spec.commandLine().getErr().println("gyreplan: the desktop app is not available in this build ("
                    + launcherName + " not found); the command line works without it");
            return 1;
        }
        if (java.awt.GraphicsEnvironment.isHeadless() && System.getenv("DISPLAY") == null
                && System.getenv("WAYLAND_DISPLAY") == null && !System.getProperty("os.name", "").startsWith("Windows")
                && !System.getProperty("os.name", "").startsWith("Mac")) {
            spec.commandLine().getErr().println("gyreplan: no display found (DISPLAY is not set); the desktop app needs one");
            return 1;
        }
        try {
            main.invoke(null, (Object) (scenario == null ? new String[0] : new String[] {scenario.toString()}));
            return 0;
        } catch (InvocationTargetException e) {
            spec.commandLine().getErr().println("gyreplan: the desktop app failed: " + GyreplanCommand.oneLine(e.getCause()));
            return 1;
        } catch (IllegalAccessException e) {
            spec.commandLine().getErr().println("gyreplan: cannot start the desktop app: " + e.getMessage());
            return 1;
        }
    }
}
