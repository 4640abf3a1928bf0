package org.gyreplan.app.desktop;

import javafx.application.Application;
import javafx.scene.Scene;
import javafx.stage.Stage;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * The JavaFX application. Opens the scenario given as the first argument, or the demo scenario
 * ({@code scenarios/demo/scenario.yaml}, looked up from the working directory and the install folder)
 * when none is given, and runs it in the background.
 */
public class GyreplanDesktop extends Application {
    private MainWindow window;

    @Override
    public void start(Stage stage) {
        List<String> args = getParameters().getRaw();
        Path scenario = args.isEmpty() ? demoScenario() : Path.of(args.get(0));
        window = new MainWindow(DesktopServices.runner(), DesktopServices.scenarioFiles(), null);
        window.setTitleSink(stage::setTitle);
        Scene scene = new Scene(window, 1400, 880);
        stage.setScene(scene);
        stage.show();
        if (scenario != null) {
            if (Files.isRegularFile(scenario)) window.openScenario(scenario);
            else window.error("Scenario file not found: " + scenario.toAbsolutePath(), null);
        } else {
            window.error("No scenario given and the demo scenario (scenarios/demo/scenario.yaml) was not found; "
                    + "use File → Open scenario…", null);
        }
    }

    @Override
    public void stop() {
        if (window != null) window.cancelRun();
    }

    /** The demo scenario: from the working directory, or next to the installation, or null. */
    static Path demoScenario() {
        Path rel = Path.of("scenarios", "demo", "scenario.yaml");
        if (Files.isRegularFile(rel)) return rel;
        String home = System.getProperty("gyreplan.home");
        if (home != null && Files.isRegularFile(Path.of(home).resolve(rel))) return Path.of(home).resolve(rel);
        try {
            Path here = Path.of(GyreplanDesktop.class.getProtectionDomain().getCodeSource().getLocation().toURI());
            for (Path p = here; p != null; p = p.getParent()) {
                if (Files.isRegularFile(p.resolve(rel))) return p.resolve(rel);
            }
        } catch (Exception ignored) {
            // no code source: fall through
        }
        return null;
    }
}
