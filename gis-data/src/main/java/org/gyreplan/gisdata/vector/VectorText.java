package org.gyreplan.gisdata.vector;

import java.math.BigDecimal;
import java.math.RoundingMode;

/** Locale-independent number text shared by the text writers (GeoJSON, KML, GPX, CSV). */
public final class VectorText {
    private VectorText() {}

    /** A coordinate in degrees rounded to 7 decimals (about 1 cm), without trailing zeros, e.g. {@code -12.5}. */
    public static String coordinate(double deg) {
        return fixed(deg, 7);
    }

    /** A number rounded to the given decimals, trailing zeros removed, never in exponent form, no "-0". */
    public static String fixed(double v, int decimals) {
        if (!Double.isFinite(v)) throw new IllegalArgumentException("not a finite number: " + v);
        BigDecimal d = new BigDecimal(v).setScale(decimals, RoundingMode.HALF_EVEN).stripTrailingZeros();
        if (d.signum() == 0) return "0";
        return d.toPlainString();
    }

    /** The shortest text that reads back as the same double (Java's algorithm), without a trailing ".0". */
    public static String number(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            if (v == 0) return "0";
            return Long.toString((long) v);
        }
        return Double.toString(v);
    }
}
