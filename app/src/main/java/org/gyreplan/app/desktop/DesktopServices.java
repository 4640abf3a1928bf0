package org.gyreplan.app.desktop;

/**
 * Connects the desktop to the study pipeline and the scenario files of the {@code app} module.
 */
public final class DesktopServices {
    private DesktopServices() { }

    /** The runner used by the application. */
    public static StudyRunner runner() {
        return (scenario, outDir, progress, cancel) -> {
            throw new UnsupportedOperationException("the study pipeline is not part of this build yet; cannot run " + scenario);
        };
    }

    /** Scenario reading and saving, or null when not available. */
    public static ScenarioFiles scenarioFiles() { return null; }
}
