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
        try {
            if (name.endsWith(".nc") || name.endsWith(".cdf") || name.endsWith(".nc4") || name.endsWith(".netcdf")) {
                return org.gyreplan.gisdata.cf.FileInspector.describe(file).toText();
            }
            if (name.endsWith(".geojson") || name.endsWith(".json") || name.endsWith(".shp") || name.endsWith(".gpkg")
                    || name.endsWith(".wkt")) {
                return polygons(file);
            }
            if (name.endsWith(".csv")) {
                var s = org.gyreplan.gisdata.csv.StationWindCsv.read(file);
                return "Station wind CSV " + file + "\n  " + s + "\n";
            }
        } catch (java.io.IOException | IllegalArgumentException e) {
            throw new CannotInspect(e.getMessage() == null ? e.toString() : e.getMessage(), e);
        }
        throw new CannotInspect("unknown kind of file; known: netCDF (.nc, .cdf), polygon files (.geojson, .shp, .gpkg, .wkt),"
                + " station wind CSV (.csv) and scenarios (.yaml)");
    }

    private static String polygons(Path file) throws java.io.IOException {
        var all = org.gyreplan.gisdata.vector.PolygonFiles.read(file);
        StringBuilder b = new StringBuilder("Polygon file ").append(file).append('\n');
        b.append("  polygons: ").append(all.size()).append('\n');
        for (var f : all) {
            var e = f.polygon().getEnvelopeInternal();
            int holes = 0;
            for (int k = 0; k < f.polygon().getNumGeometries(); k++) {
                if (f.polygon().getGeometryN(k) instanceof org.locationtech.jts.geom.Polygon p) holes += p.getNumInteriorRing();
            }
            b.append(String.format(Locale.ROOT, "  - %s: lon %.3f…%.3f°, lat %.3f…%.3f°, %d hole(s)%s%n",
                    f.name() == null ? "(no name)" : f.name(), e.getMinX(), e.getMaxX(), e.getMinY(), e.getMaxY(), holes,
                    f.repaired() ? ", repaired" : ""));
        }
        b.append("  use as: basin.polygon (water inside; holes are islands) or exclusionZones\n");
        return b.toString();
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
