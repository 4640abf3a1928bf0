package org.gyreplan.app.pipeline;

import org.gyreplan.app.scenario.Scenario;
import org.gyreplan.app.scenario.ScenarioException;
import org.gyreplan.app.scenario.ScenarioFiles;

import java.nio.file.Path;
import java.util.Locale;

/** Describes an input file: what it holds and how a run would read it (used by {@code gyreplan inspect}). */
public final class Inspection {
    private Inspection() {}

    /** The file cannot be described (unknown kind or unreadable); the message says why. */
    public static final class CannotInspect extends Exception {
        public CannotInspect(String message) { super(message); }
        public CannotInspect(String message, Throwable cause) { super(message, cause); }
    }

    public static String describe(Path file) throws CannotInspect {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".yaml") || name.endsWith(".yml")) return scenario(file);
        throw new CannotInspect("no reader for this kind of file in this build (known: .yaml scenario files)");
    }

    private static String scenario(Path file) throws CannotInspect {
        Scenario s;
        try {
            s = ScenarioFiles.load(file);
        } catch (ScenarioException e) {
            throw new CannotInspect("scenario with problems:\n" + e.getMessage(), e);
        }
        StringBuilder b = new StringBuilder();
        b.append("Scenario file ").append(file).append('\n');
        b.append("  study:        ").append(s.study.name).append('\n');
        b.append("  basin:        ").append(s.basin.polygon != null ? "polygon file " + s.resolve(s.basin.polygon)
                : "inline ring of " + s.basin.coordinates.size() + " points").append(s.basin.islands == null ? "" : ", "
                + s.basin.islands.size() + " island(s)").append('\n');
        b.append("  winds:        ").append(s.winds.source.name().toLowerCase(Locale.ROOT)).append(", ")
                .append(s.resolve(s.winds.file)).append('\n');
        b.append("  time window:  ").append(s.winds.start == null ? "start of data" : s.winds.start).append(" to ")
                .append(s.winds.end == null ? "end of data" : s.winds.end).append('\n');
        b.append("  drag law:     ").append(s.dragLaw.name).append('\n');
        b.append("  gyre:         ").append(s.gyre.model.name().toLowerCase(Locale.ROOT)).append(", H = ").append(s.gyre.depth).append(" m\n");
        b.append("  grid spacing: ").append(s.grid.spacingDeg).append("°\n");
        b.append("  planning:     ").append(s.moorings == null ? "no moorings" : s.moorings.count + " moorings")
                .append(", ").append(s.survey == null ? "no survey" : "survey from " + s.survey.port.name).append('\n');
        b.append("  expected:     ").append(s.expectedOrEmpty().size()).append(" checks\n");
        b.append("  valid:        yes\n");
        return b.toString();
    }
}
