package org.gyreplan.app.pipeline;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Small scenarios for fast tests: a square basin inside the demo's synthetic winds, ten days. */
public final class TestScenarios {
    private TestScenarios() {}

    /** The demo wind file (synthetic, committed). */
    public static Path demoWinds() {
        return Path.of("..", "scenarios", "demo", "winds.nc").toAbsolutePath().normalize();
    }

    /** Writes {@code study.yaml} into {@code dir} and returns its path. */
    public static Path small(Path dir, String name, String outputs, String extra) throws IOException {
        Path s = dir.resolve("study.yaml");
        Files.writeString(s, """
                study: {name: %s}
                basin:
                  coordinates: [[-140, 30], [-134, 30], [-134, 36], [-140, 36]]
                winds:
                  source: gridded
                  file: %s
                  start: 2021-01-01
                  end: 2021-01-10
                dragLaw: {name: large-yeager-2004}
                gyre:
                  depth: 1000
                  model: stommel
                  bottomFriction: 1.0e-5
                grid: {spacingDeg: 0.5}
                coast:
                  points:
                    - {name: East Point, lonDeg: -134, latDeg: 33}
                outputs: [%s]
                %s""".formatted(name, demoWinds(), outputs, extra));
        return s;
    }
}
