package org.gyreplan.app.scenario;

import com.fasterxml.jackson.core.JsonLocation;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.function.Function;

/**
 * Checks a bound scenario for impossible or missing values and missing files, before any work starts.
 * Every problem names the key and, when the scenario came from a file, the line of that key.
 */
public final class ScenarioValidator {
    private ScenarioValidator() {}

    /** Roles a {@code winds.variables} mapping may name. */
    public static final Set<String> WIND_VARIABLE_ROLES =
            Set.of("eastward", "northward", "speed", "direction", "pressure", "time", "longitude", "latitude");
    /** Criteria a {@code moorings.weights} block may weigh. */
    public static final Set<String> MOORING_WEIGHTS = Set.of("persistence", "intensity", "variability", "portProximity");

    /** Validates an in-memory scenario (e.g. edited in the desktop app); no line numbers. */
    public static List<ScenarioProblem> validate(Scenario s) {
        return validate(s, p -> null, s.sourceFile);
    }

    /**
     * @param s     the scenario
     * @param where JSON pointer → location of that key in the file, or null when unknown
     * @param file  file name used in messages
     */
    public static List<ScenarioProblem> validate(Scenario s, Function<String, JsonLocation> where, Path file) {
        Checker c = new Checker(s, where, file);
        c.run();
        return c.problems;
    }

    /** Parses a scenario date or date-time (UTC). Accepts {@code 2021-01-01} and {@code 2021-01-01T06:00:00Z}. */
    public static Optional<Instant> parseInstant(String text) {
        if (text == null) return Optional.empty();
        try {
            return Optional.of(LocalDate.parse(text).atStartOfDay().toInstant(ZoneOffset.UTC));
        } catch (DateTimeParseException ignored) { /* try the next form */ }
        try {
            return Optional.of(Instant.parse(text));
        } catch (DateTimeParseException ignored) { /* try the next form */ }
        try {
            return Optional.of(LocalDateTime.parse(text).toInstant(ZoneOffset.UTC));
        } catch (DateTimeParseException e) {
            return Optional.empty();
        }
    }

    private static final class Checker {
        final Scenario s;
        final Function<String, JsonLocation> where;
        final Path file;
        final List<ScenarioProblem> problems = new ArrayList<>();

        Checker(Scenario s, Function<String, JsonLocation> where, Path file) {
            this.s = s;
            this.where = where;
            this.file = file;
        }

        void problem(String pointer, String message) {
            JsonLocation loc = where.apply(pointer);
            String key = pointer.replaceFirst("^/", "").replaceAll("/(\\d+)(?=/|$)", "[$1]").replace('/', '.');
            problems.add(new ScenarioProblem(file, loc == null ? 0 : loc.getLineNr(),
                    loc == null ? 0 : loc.getColumnNr(), key, message));
        }

        void required(String pointer, Object value, String what) {
            if (value == null || (value instanceof String str && str.isBlank())) problem(pointer, "missing; expected " + what);
        }

        /** lo &lt; v (or ≤ when inclusive) and v ≤ hi. */
        void range(String pointer, Double v, double lo, boolean loInclusive, double hi, String unit) {
            if (v == null) return;
            boolean ok = Double.isFinite(v) && (loInclusive ? v >= lo : v > lo) && v <= hi;
            if (!ok) {
                problem(pointer, "must be " + (loInclusive ? "≥ " : "> ") + num(lo) + " and ≤ " + num(hi)
                        + (unit.isEmpty() ? "" : " " + unit) + ", got " + num(v));
            }
        }

        void fileExists(String pointer, String name, String what) {
            if (name == null) return;
            Path p = s.resolve(name);
            if (!Files.isRegularFile(p)) problem(pointer, what + " not found: " + p);
        }

        void run() {
            // study
            if (s.study == null) problem("/study", "missing; expected a block with 'name'");
            else required("/study/name", s.study.name, "a short study title");

            basin();
            grid();
            winds();
            dragLaw();
            constants();
            gyre();
            coast();
            fileExists("/bathymetry", s.bathymetry, "bathymetry file");
            fileExists("/exclusionZones", s.exclusionZones, "exclusion-zone file");
            moorings();
            survey();
            expected();
        }

        void basin() {
            Scenario.Basin b = s.basin;
            if (b == null) { problem("/basin", "missing; expected 'polygon' (a file) or 'coordinates'"); return; }
            boolean hasFile = b.polygon != null, hasInline = b.coordinates != null;
            if (hasFile == hasInline) {
                problem("/basin", "give exactly one of 'polygon' (a file) or 'coordinates' (inline [lonDeg, latDeg] pairs)");
            }
            fileExists("/basin/polygon", b.polygon, "basin polygon file");
            if (hasInline) ring("/basin/coordinates", b.coordinates);
            if (b.islands != null) {
                for (int k = 0; k < b.islands.size(); k++) ring("/basin/islands/" + k, b.islands.get(k));
            }
        }

        void ring(String pointer, List<List<Double>> ring) {
            if (ring == null || ring.size() < 3) {
                problem(pointer, "a polygon ring needs at least 3 [lonDeg, latDeg] points");
                return;
            }
            for (int k = 0; k < ring.size(); k++) {
                List<Double> pt = ring.get(k);
                String ptr = pointer + "/" + k;
                if (pt == null || pt.size() != 2 || pt.get(0) == null || pt.get(1) == null) {
                    problem(ptr, "expected a pair [lonDeg, latDeg]");
                    continue;
                }
                range(ptr, pt.get(0), -180, true, 360, "° longitude");
                range(ptr, pt.get(1), -90, true, 90, "° latitude");
            }
        }

        void grid() {
            Scenario.GridSpec g = s.grid;
            if (g == null) return;
            required("/grid/spacingDeg", g.spacingDeg, "the cell size in degrees, e.g. 0.25");
            range("/grid/spacingDeg", g.spacingDeg, 0, false, 5, "°");
            int given = (g.westDeg != null ? 1 : 0) + (g.eastDeg != null ? 1 : 0)
                    + (g.southDeg != null ? 1 : 0) + (g.northDeg != null ? 1 : 0);
            if (given != 0 && given != 4) problem("/grid", "give all four of westDeg, eastDeg, southDeg, northDeg, or none");
            if (given == 4) {
                if (!(g.westDeg < g.eastDeg)) problem("/grid/eastDeg", "must be greater than westDeg (" + num(g.westDeg) + ")");
                if (!(g.southDeg < g.northDeg)) problem("/grid/northDeg", "must be greater than southDeg (" + num(g.southDeg) + ")");
                range("/grid/southDeg", g.southDeg, -90, true, 90, "°");
                range("/grid/northDeg", g.northDeg, -90, true, 90, "°");
            }
        }

        void winds() {
            Scenario.Winds w = s.winds;
            if (w == null) { problem("/winds", "missing; expected 'source' and 'file'"); return; }
            required("/winds/source", w.source, "one of " + String.join(", ", ScenarioFiles.enumNames(Scenario.WindSourceKind.class)));
            required("/winds/file", w.file, w.source == Scenario.WindSourceKind.STATION
                    ? "a station CSV file" : "a netCDF file");
            fileExists("/winds/file", w.file, "wind file");
            if (w.variables != null) {
                for (String role : w.variables.keySet()) {
                    if (!WIND_VARIABLE_ROLES.contains(role)) {
                        problem("/winds/variables/" + role, "unknown role '" + role + "'; allowed: "
                                + String.join(", ", WIND_VARIABLE_ROLES.stream().sorted().toList()));
                    }
                }
            }
            if (w.source == Scenario.WindSourceKind.STATION) {
                if (w.station == null) problem("/winds/station", "a station source needs 'station' with lonDeg and latDeg");
                else {
                    required("/winds/station/lonDeg", w.station.lonDeg, "the station longitude in degrees east");
                    required("/winds/station/latDeg", w.station.latDeg, "the station latitude in degrees north");
                    range("/winds/station/latDeg", w.station.latDeg, -90, true, 90, "°");
                }
            } else if (w.station != null) {
                problem("/winds/station", "only used with 'source: station'");
            }
            Instant a = instant("/winds/start", w.start), b = instant("/winds/end", w.end);
            if (a != null && b != null && b.isBefore(a)) problem("/winds/end", "must not be before start (" + w.start + ")");
        }

        Instant instant(String pointer, String text) {
            if (text == null) return null;
            Optional<Instant> t = parseInstant(text);
            if (t.isEmpty()) problem(pointer, "expected a date such as 2021-01-01 or 2021-01-01T06:00:00Z, got '" + text + "'");
            return t.orElse(null);
        }

        void dragLaw() {
            Scenario.DragLawSpec d = s.dragLaw;
            if (d == null) { problem("/dragLaw", "missing; the drag law must be chosen explicitly, e.g. name: large-pond-1981"); return; }
            required("/dragLaw/name", d.name, "a drag-law name");
            List<String> known = Vocabulary.dragLawNames();
            if (d.name != null && !known.isEmpty() && !known.contains(d.name)) {
                problem("/dragLaw/name", "unknown drag law '" + d.name + "'; allowed: " + String.join(", ", known));
            }
            if ("constant".equals(d.name)) {
                required("/dragLaw/dragCoefficient", d.dragCoefficient, "C_D for the constant law, e.g. 0.0013");
            }
            range("/dragLaw/dragCoefficient", d.dragCoefficient, 0, false, 0.01, "");
        }

        void constants() {
            Scenario.Constants k = s.constants;
            if (k == null) return;
            range("/constants/rho0", k.rho0, 950, true, 1100, "kg m-3 (sea water)");
            range("/constants/rhoAir", k.rhoAir, 0.8, true, 1.6, "kg m-3 (air near the sea surface)");
            range("/constants/equatorialCutoffDeg", k.equatorialCutoffDeg, 0, true, 30, "°");
            range("/constants/omega", k.omega, 0, false, 1e-3, "rad s-1");
            range("/constants/earthRadius", k.earthRadius, 1e6, true, 1e7, "m");
        }

        void gyre() {
            Scenario.Gyre g = s.gyre;
            if (g == null) return;
            required("/gyre/model", g.model, "one of " + String.join(", ", ScenarioFiles.enumNames(Scenario.GyreModel.class)));
            required("/gyre/depth", g.depth, "the depth H of the wind-driven layer in metres");
            range("/gyre/depth", g.depth, 0, false, 11000, "m");
            range("/gyre/spacingDeg", g.spacingDeg, 0, false, 5, "°");
            if (g.model == Scenario.GyreModel.STOMMEL) {
                required("/gyre/bottomFriction", g.bottomFriction, "the Stommel friction rate r in s-1, e.g. 1.0e-6");
            }
            range("/gyre/bottomFriction", g.bottomFriction, 0, false, 1e-3, "s-1");
            if (g.model == Scenario.GyreModel.MUNK) {
                required("/gyre/lateralViscosity", g.lateralViscosity, "the Munk viscosity A_H in m2 s-1, e.g. 5000");
                required("/gyre/wall", g.wall, "the wall condition, one of " + String.join(", ", ScenarioFiles.enumNames(Scenario.Wall.class)));
            }
            range("/gyre/lateralViscosity", g.lateralViscosity, 0, false, 1e6, "m2 s-1");
        }

        void coast() {
            Scenario.Coast c = s.coast;
            if (c == null) return;
            range("/coast/spacingKm", c.spacingKm, 0, false, 2000, "km");
            range("/coast/smoothingKm", c.smoothingKm, 0, true, 2000, "km");
            range("/coast/bandWidthKm", c.bandWidthKm, 0, false, 1000, "km");
            if (c.points != null) {
                for (int k = 0; k < c.points.size(); k++) point("/coast/points/" + k, c.points.get(k));
            }
        }

        void point(String pointer, Scenario.NamedPoint p) {
            if (p == null) { problem(pointer, "expected name, lonDeg, latDeg"); return; }
            required(pointer + "/name", p.name, "a name");
            required(pointer + "/lonDeg", p.lonDeg, "longitude in degrees east");
            required(pointer + "/latDeg", p.latDeg, "latitude in degrees north");
            range(pointer + "/lonDeg", p.lonDeg, -180, true, 360, "°");
            range(pointer + "/latDeg", p.latDeg, -90, true, 90, "°");
        }

        void moorings() {
            Scenario.Moorings m = s.moorings;
            if (m == null) return;
            if (m.count != null && (m.count < 1 || m.count > 50)) problem("/moorings/count", "must be between 1 and 50, got " + m.count);
            range("/moorings/minDepth", m.minDepth, 0, true, 11000, "m");
            range("/moorings/maxDepth", m.maxDepth, 0, false, 11000, "m");
            if (m.minDepth != null && m.maxDepth != null && !(m.maxDepth > m.minDepth)) {
                problem("/moorings/maxDepth", "must be greater than minDepth (" + num(m.minDepth) + " m)");
            }
            range("/moorings/minSeparationKm", m.minSeparationKm, 0, true, 5000, "km");
            range("/moorings/maxDistanceFromPortKm", m.maxDistanceFromPortKm, 0, false, 20000, "km");
            if (m.weights != null) {
                for (Map.Entry<String, Double> e : m.weights.entrySet()) {
                    String ptr = "/moorings/weights/" + e.getKey();
                    if (!MOORING_WEIGHTS.contains(e.getKey())) {
                        problem(ptr, "unknown criterion '" + e.getKey() + "'; allowed: "
                                + String.join(", ", MOORING_WEIGHTS.stream().sorted().toList()));
                    }
                    range(ptr, e.getValue(), 0, true, 1000, "");
                }
            }
        }

        void survey() {
            Scenario.Survey v = s.survey;
            if (v == null) return;
            if (v.port == null) problem("/survey/port", "missing; expected name, lonDeg, latDeg of the home port");
            else point("/survey/port", v.port);
            range("/survey/shipSpeedKnots", v.shipSpeedKnots, 0, false, 30, "knots");
            range("/survey/stationSpacingKm", v.stationSpacingKm, 0, false, 500, "km");
            range("/survey/transectLengthKm", v.transectLengthKm, 0, false, 2000, "km");
            if (v.transectCount != null && (v.transectCount < 1 || v.transectCount > 100)) {
                problem("/survey/transectCount", "must be between 1 and 100, got " + v.transectCount);
            }
            range("/survey/stationTimeHours", v.stationTimeHours, 0, true, 48, "h");
            range("/survey/weatherDowntimePercent", v.weatherDowntimePercent, 0, true, 90, "%");
            instant("/survey/start", v.start);
        }

        void expected() {
            if (s.expected == null) return;
            for (Map.Entry<String, Scenario.Expectation> e : s.expected.entrySet()) {
                String ptr = "/expected/" + e.getKey();
                if (Headline.byKey(e.getKey()).isEmpty()) {
                    problem(ptr, "unknown quantity '" + e.getKey() + "'; allowed: " + String.join(", ", Headline.keys()));
                    continue;
                }
                Scenario.Expectation x = e.getValue();
                if (x == null || (x.value == null && x.min == null && x.max == null)) {
                    problem(ptr, "expected 'value' with 'tolerance', or 'min' and/or 'max'");
                    continue;
                }
                if (x.value != null && x.tolerance == null) problem(ptr + "/tolerance", "missing; every expected value needs a tolerance");
                if (x.tolerance != null && !(x.tolerance >= 0)) problem(ptr + "/tolerance", "must be ≥ 0, got " + num(x.tolerance));
                if (x.min != null && x.max != null && x.min > x.max) problem(ptr + "/max", "must be ≥ min (" + num(x.min) + ")");
            }
        }

        static String num(double v) {
            if (v == Math.rint(v) && Math.abs(v) < 1e15) return Long.toString((long) v);
            return Double.toString(v);
        }
    }
}
