package org.gyreplan.gisdata.csv;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Speed units accepted for wind input, with their exact factors to m s⁻¹.
 * <ul>
 *   <li>knot: 1 international nautical mile (1852 m, exact) per hour — BIPM SI Brochure, 9th ed. (2019), Table 8;</li>
 *   <li>km/h: 1000 m per 3600 s (exact);</li>
 *   <li>mph: 0.44704 m s⁻¹ (international mile of 1609.344 m, exact, 1959 yard and pound agreement).</li>
 * </ul>
 */
public enum SpeedUnit {
    /** Metre per second (SI). */
    METRE_PER_SECOND(1.0, "m/s", "m s-1", "m s^-1", "m.s-1", "ms-1", "m/sec", "mps", "metre per second", "meter per second", "meters per second", "metres per second"),
    /** Knot, 1852 m h⁻¹. */
    KNOT(1852.0 / 3600.0, "kn", "kt", "kts", "knot", "knots"),
    /** Kilometre per hour. */
    KILOMETRE_PER_HOUR(1000.0 / 3600.0, "km/h", "km h-1", "km h^-1", "kmh", "kph", "km/hr"),
    /** Statute mile per hour. */
    MILE_PER_HOUR(0.44704, "mph", "mi/h");

    private final double toMetrePerSecond;
    private final List<String> spellings;

    SpeedUnit(double toMetrePerSecond, String... spellings) {
        this.toMetrePerSecond = toMetrePerSecond;
        this.spellings = List.of(spellings);
    }

    /** Factor from this unit to m s⁻¹. */
    public double toMetrePerSecond() { return toMetrePerSecond; }

    /** Converts a speed in this unit to m s⁻¹. */
    public double toSi(double value) { return value * toMetrePerSecond; }

    /** The preferred spelling, e.g. "kn". */
    public String symbol() { return spellings.get(0); }

    /** Recognises a unit spelling (case-insensitive, spaces collapsed), e.g. "kn", "m/s", "km/h". */
    public static Optional<SpeedUnit> parse(String text) {
        if (text == null) return Optional.empty();
        String t = text.trim().toLowerCase(Locale.ROOT).replaceAll("\\s+", " ");
        for (SpeedUnit u : values()) {
            for (String s : u.spellings) if (s.equals(t)) return Optional.of(u);
        }
        return Optional.empty();
    }

    /** All accepted spellings, for error messages. */
    public static String accepted() {
        StringBuilder b = new StringBuilder();
        for (SpeedUnit u : values()) {
            if (b.length() > 0) b.append("; ");
            b.append(String.join(", ", u.spellings));
        }
        return b.toString();
    }
}
