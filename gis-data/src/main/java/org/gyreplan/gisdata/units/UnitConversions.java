package org.gyreplan.gisdata.units;

import java.util.HashMap;
import java.util.Locale;
import java.util.Map;

/**
 * Converts values in a file's unit to SI: {@code si = value × factor} (all supported units are proportional).
 *
 * <table>
 *   <caption>Supported units (spelling is case-insensitive; "/x" and " x-1" are equivalent)</caption>
 *   <tr><th>quantity</th><th>SI unit</th><th>accepted</th></tr>
 *   <tr><td>speed</td><td>m s⁻¹</td><td>m/s, m s-1, meters/second, cm/s (×0.01), knots, kt, kn (×1852/3600),
 *       km/h (×1/3.6), mph (×0.44704)</td></tr>
 *   <tr><td>pressure</td><td>Pa</td><td>Pa, hPa (×100), mbar, mb, millibar(s) (×100), kPa (×1000), bar (×10⁵),
 *       atm (×101325)</td></tr>
 *   <tr><td>stress</td><td>Pa = N m⁻²</td><td>Pa, N/m2, N m-2, kg m-1 s-2, dyn/cm2 (×0.1), mPa (×0.001)</td></tr>
 *   <tr><td>length</td><td>m</td><td>m, meters, metres, km (×1000), cm (×0.01), ft (×0.3048), fathoms (×1.8288)</td></tr>
 * </table>
 *
 * <p>Exact definitions: 1 knot = 1852 m per hour (international nautical mile); 1 mbar = 1 hPa = 100 Pa;
 * 1 dyn cm⁻² = 10⁻⁵ N / 10⁻⁴ m² = 0.1 Pa; 1 ft = 0.3048 m; 1 fathom = 6 ft (common practice, SI Brochure
 * and NIST SP 811 for the definitions).
 */
public final class UnitConversions {
    private UnitConversions() {}

    /** Physical quantities with an SI unit. */
    public enum Quantity {
        SPEED("m s-1", "a speed unit such as m s-1, m/s, knots, cm/s, km/h"),
        PRESSURE("Pa", "a pressure unit such as Pa, hPa, mbar, millibars"),
        STRESS("Pa", "a stress unit such as Pa, N m-2, N/m2, dyn/cm2"),
        LENGTH("m", "a length unit such as m, meters, km, ft, fathoms");

        private final String si;
        private final String expected;

        Quantity(String si, String expected) {
            this.si = si;
            this.expected = expected;
        }

        /** The SI unit string (UDUNITS spelling). */
        public String siUnit() { return si; }
        /** Text for error messages: what was expected. */
        public String expected() { return expected; }
    }

    /** An unknown or inappropriate unit string. */
    public static final class UnknownUnitsException extends IllegalArgumentException {
        public UnknownUnitsException(String message) { super(message); }
    }

    private static final Map<Quantity, Map<String, Double>> TABLE = new HashMap<>();

    private static void add(Quantity q, double f, String... names) {
        Map<String, Double> m = TABLE.computeIfAbsent(q, k -> new HashMap<>());
        for (String n : names) m.put(normalise(n), f);
    }

    static {
        add(Quantity.SPEED, 1.0, "m s-1", "m/s", "meter/second", "meters/second", "metre/second", "metres/second",
                "meters per second", "metres per second", "mps", "m/sec", "ms-1", "m.s-1", "m sec-1");
        add(Quantity.SPEED, 0.01, "cm s-1", "cm/s", "cm/sec", "centimeters/second", "centimetres/second");
        add(Quantity.SPEED, 1852.0 / 3600.0, "knots", "knot", "kt", "kts", "kn", "nautical miles per hour");
        add(Quantity.SPEED, 1.0 / 3.6, "km h-1", "km/h", "km/hr", "kph", "kmh");
        add(Quantity.SPEED, 0.44704, "mph", "mi/h", "miles per hour");
        add(Quantity.PRESSURE, 1.0, "Pa", "pascal", "pascals", "N m-2", "N/m2");
        add(Quantity.PRESSURE, 100.0, "hPa", "hectopascal", "hectopascals", "mbar", "mb", "millibar", "millibars", "mbars");
        add(Quantity.PRESSURE, 1000.0, "kPa", "kilopascal", "cbar");
        add(Quantity.PRESSURE, 1e5, "bar", "bars");
        add(Quantity.PRESSURE, 101325.0, "atm");
        add(Quantity.STRESS, 1.0, "Pa", "pascal", "pascals", "N m-2", "N/m2", "N/m^2", "newton/m2", "newtons/m2",
                "newton meter-2", "newtons per square meter", "kg m-1 s-2");
        add(Quantity.STRESS, 0.1, "dyn cm-2", "dyn/cm2", "dyne/cm2", "dynes/cm2", "dyne cm-2", "dynes cm-2");
        add(Quantity.STRESS, 0.001, "mPa", "millipascal");
        add(Quantity.LENGTH, 1.0, "m", "meter", "meters", "metre", "metres");
        add(Quantity.LENGTH, 1000.0, "km", "kilometer", "kilometers", "kilometre", "kilometres");
        add(Quantity.LENGTH, 0.01, "cm", "centimeter", "centimeters", "centimetre", "centimetres");
        add(Quantity.LENGTH, 0.3048, "ft", "feet", "foot");
        add(Quantity.LENGTH, 1.8288, "fathom", "fathoms", "fm");
    }

    /**
     * Normalises a unit string: lower case (except that "Pa"/"mPa"/"hPa" become lower case too), "**" and "^"
     * removed, "·", "*" and "." between symbols as spaces, "a/b" as "a b-1", "a/b2" as "a b-2".
     */
    static String normalise(String u) {
        String s = u.trim().toLowerCase(Locale.ROOT);
        s = s.replace("**", "").replace("^", "").replace("·", " ").replace("*", " ");
        s = s.replaceAll("(?<=[a-z])\\.(?=[a-z])", " ");
        s = s.replaceAll("\\s+", " ");
        s = s.replaceAll("\\s*/\\s*", "/");
        // "a/b" → "a b-1", "a/b2" → "a b-2"
        int slash = s.indexOf('/');
        if (slash > 0 && s.indexOf('/', slash + 1) < 0 && !s.contains(" per ")) {
            String num = s.substring(0, slash), den = s.substring(slash + 1);
            java.util.regex.Matcher m = java.util.regex.Pattern.compile("([a-z]+)(\\d*)").matcher(den);
            if (m.matches()) {
                String p = m.group(2).isEmpty() ? "1" : m.group(2);
                s = num + " " + m.group(1) + "-" + p;
            }
        }
        return s;
    }

    /**
     * Factor that converts a value in {@code units} to the SI unit of {@code q}.
     *
     * @throws UnknownUnitsException if the unit is unknown for that quantity, naming the unit and what was expected
     */
    public static double factorToSI(Quantity q, String units) {
        return factorToSI(q, units, null);
    }

    /**
     * As {@link #factorToSI(Quantity, String)}, with a context (e.g. "variable 'u10' in /data/w.nc") for the error.
     */
    public static double factorToSI(Quantity q, String units, String context) {
        String where = context == null ? "" : context + ": ";
        if (units == null || units.isBlank()) {
            throw new UnknownUnitsException(where + "no units given; expected " + q.expected());
        }
        Double f = TABLE.get(q).get(normalise(units));
        if (f == null) {
            throw new UnknownUnitsException(where + "unknown units '" + units + "'; expected " + q.expected());
        }
        return f;
    }

    /** Whether the unit string is a known unit of that quantity. */
    public static boolean isKnown(Quantity q, String units) {
        return units != null && TABLE.get(q).containsKey(normalise(units));
    }

    /** Converts one value to SI. */
    public static double toSI(Quantity q, String units, double value) {
        return value * factorToSI(q, units);
    }

    /** Converts an SI value to the given unit (e.g. m s⁻¹ → knots for a report). */
    public static double fromSI(Quantity q, String units, double siValue) {
        return siValue / factorToSI(q, units);
    }
}
