package org.gyreplan.app.desktop;

import javafx.application.Application;

/**
 * Entry point of the desktop app, loaded reflectively by the command line ({@code gyreplan desktop [scenario]})
 * so that the command line itself never loads JavaFX.
 */
public final class DesktopLauncher {
    private DesktopLauncher() { }

    /** @param args optional path of a scenario YAML file */
    public static void main(String[] args) {
        Application.launch(GyreplanDesktop.class, args);
    }
}
