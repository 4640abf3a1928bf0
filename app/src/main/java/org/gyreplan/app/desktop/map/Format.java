package org.gyreplan.app.desktop.map;

import java.util.Locale;

/** Number and coordinate formatting for the map and panels (locale-independent). */
public final class Format {
    private Format() { }

    /** A value with about 4 significant digits, scientific notation for very small or large magnitudes. */
    public static String number(double v) {
        if (Double.isNaN(v)) return "—";
        double a = Math.abs(v);
        if (a == 0) return "0";
        if (a >= 1e5 || a < 1e-3) return String.format(Locale.ROOT, "%.3e", v);
        int decimals = Math.max(0, 3 - (int) Math.floor(Math.log10(a)));
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }

    /** A short label for ticks and keys: at most 3 significant digits, no trailing zeros ("0.2", "-22.5", "-1e-7"). */
    public static String tick(double v) {
        if (Double.isNaN(v)) return "—";
        double a = Math.abs(v);
        if (a == 0) return "0";
        if (a >= 1e5 || a < 1e-3) {
            String s = String.format(Locale.ROOT, "%.2e", v);
            String[] parts = s.split("e");
            String mant = stripZeros(parts[0]);
            int exp = Integer.parseInt(parts[1]);
            return mant + "e" + exp;
        }
        int decimals = Math.max(0, 2 - (int) Math.floor(Math.log10(a)));
        return stripZeros(String.format(Locale.ROOT, "%." + decimals + "f", v));
    }

    private static String stripZeros(String s) {
        if (!s.contains(".")) return s;
        s = s.replaceAll("0+$", "");
        return s.endsWith(".") ? s.substring(0, s.length() - 1) : s;
    }

    /** Latitude as e.g. "34.250° N". */
    public static String lat(double latDeg) {
        return String.format(Locale.ROOT, "%.3f° %s", Math.abs(latDeg), latDeg >= 0 ? "N" : "S");
    }

    /** Longitude (wrapped to ±180) as e.g. "12.500° W". */
    public static String lon(double lonDeg) {
        double l = ((lonDeg + 180) % 360 + 360) % 360 - 180;
        return String.format(Locale.ROOT, "%.3f° %s", Math.abs(l), l >= 0 ? "E" : "W");
    }

    /** A short graticule label, e.g. "30°N", "15.5°W". */
    public static String tickLat(double latDeg) {
        return trim(Math.abs(latDeg)) + "°" + (latDeg > 0 ? "N" : latDeg < 0 ? "S" : "");
    }

    public static String tickLon(double lonDeg) {
        double l = ((lonDeg + 180) % 360 + 360) % 360 - 180;
        if (Math.abs(Math.abs(l) - 180) < 1e-9) return "180°";
        return trim(Math.abs(l)) + "°" + (l > 0 ? "E" : l < 0 ? "W" : "");
    }

    private static String trim(double v) {
        String s = String.format(Locale.ROOT, "%.4f", v);
        s = s.replaceAll("0+$", "");
        return s.endsWith(".") ? s.substring(0, s.length() - 1) : s;
    }
}
