package org.gyreplan.gisdata.cf;

import org.gyreplan.gisdata.netcdf.Attribute;
import org.gyreplan.gisdata.netcdf.DataType;
import org.gyreplan.gisdata.netcdf.Variable;

/**
 * Turns raw stored numbers of one variable into physical values (CF Conventions 1.8 §2.5.1 and §8.1):
 *
 * <pre>
 *   raw equal to _FillValue or to any missing_value, or outside valid_min/valid_max/valid_range → NaN
 *   otherwise   value = (raw × scale_factor + add_offset) × unitFactor
 * </pre>
 *
 * Without {@code _FillValue} the netCDF default fill value of the stored type marks unwritten values (netCDF User
 * Guide, "Fill Values"), except for BYTE. The valid range is compared with the raw (packed) numbers, as CF
 * requires when its type is that of the variable. {@code unitFactor} converts to SI (see
 * {@link org.gyreplan.gisdata.units.UnitConversions}).
 */
public final class CfDecoder {
    private final double fill;
    private final double[] missing;
    private final double validMin, validMax;
    private final double scale, offset, unitFactor;
    private final boolean floatCompare;

    /** A decoder from the variable's attributes, with a unit factor (1 for none). */
    public CfDecoder(Variable v, double unitFactor) {
        Attribute f = v.attribute("_FillValue");
        DataType t = v.dataType();
        this.fill = f != null && !f.isText() ? f.number(0) : (t == DataType.BYTE ? Double.NaN : t.defaultFill());
        Attribute mv = v.attribute("missing_value");
        // missing values other than the fill value (files often repeat _FillValue as missing_value)
        this.missing = mv != null && !mv.isText()
                ? java.util.Arrays.stream(mv.numbers()).filter(x -> x != fill).distinct().toArray() : new double[0];
        double lo = Double.NEGATIVE_INFINITY, hi = Double.POSITIVE_INFINITY;
        Attribute vr = v.attribute("valid_range");
        if (vr != null && !vr.isText() && vr.length() == 2) { lo = vr.number(0); hi = vr.number(1); }
        Attribute vmin = v.attribute("valid_min"), vmax = v.attribute("valid_max");
        if (vmin != null && !vmin.isText()) lo = vmin.number(0);
        if (vmax != null && !vmax.isText()) hi = vmax.number(0);
        this.validMin = lo;
        this.validMax = hi;
        Attribute sf = v.attribute("scale_factor"), ao = v.attribute("add_offset");
        this.scale = sf != null && !sf.isText() ? sf.number(0) : 1.0;
        this.offset = ao != null && !ao.isText() ? ao.number(0) : 0.0;
        this.unitFactor = unitFactor;
        this.floatCompare = t == DataType.FLOAT;
    }

    /** Scale (scale_factor × unit factor) applied to raw values. */
    public double scale() { return scale * unitFactor; }
    /** Offset (add_offset × unit factor) added after scaling. */
    public double offset() { return offset * unitFactor; }

    /** Whether a raw value is missing. */
    public boolean isMissing(double raw) {
        if (Double.isNaN(raw)) return true;
        if (matches(raw, fill)) return true;
        for (double m : missing) if (matches(raw, m)) return true;
        return raw < validMin || raw > validMax;
    }

    private boolean matches(double raw, double ref) {
        if (raw == ref) return true;
        // attribute and data of FLOAT type may differ in the last bit after a double round trip by other tools
        return floatCompare && Math.abs(raw - ref) <= 1e-7 * Math.abs(ref);
    }

    /** Decodes one raw value. */
    public double decode(double raw) {
        return isMissing(raw) ? Double.NaN : (raw * scale + offset) * unitFactor;
    }

    /** Decodes {@code n} values of {@code a} in place from index {@code from}. */
    public void decodeInPlace(double[] a, int from, int n) {
        double s = scale * unitFactor, o = offset * unitFactor;
        boolean simpleMissing = missing.length == 0 && validMin == Double.NEGATIVE_INFINITY
                && validMax == Double.POSITIVE_INFINITY && !floatCompare;
        for (int k = from; k < from + n; k++) {
            double r = a[k];
            if (simpleMissing ? (r == fill || r != r) : isMissing(r)) a[k] = Double.NaN;
            else a[k] = r * s + o;
        }
    }
}
