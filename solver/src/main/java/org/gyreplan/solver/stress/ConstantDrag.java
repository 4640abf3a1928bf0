package org.gyreplan.solver.stress;

/**
 * A drag coefficient that does not depend on the wind speed.
 * <pre>
 *   C_D = constant
 * </pre>
 * Symbols: C_D dimensionless.
 *
 * <p>Typical values (common practice): 1.3e-3 with 6-hourly winds in the classic sea-level-pressure upwelling index,
 * 2.6e-3 with monthly-mean pressure fields (both from memory); 2.6e-3 is also the value behind Ekman's empirical
 * constants (Stewart, Introduction to Physical Oceanography, ch. 9). A single effective C_D is good to about 10 %
 * only (Trenberth, Large &amp; Olson 1989, J. Climate 2, 1507–1516). Valid for every speed (no range is claimed).
 *
 * @param value the drag coefficient, dimensionless, in (0, 0.1)
 */
public record ConstantDrag(double value) implements DragLaw {

    public ConstantDrag {
        if (!(value > 0 && value < 0.1)) {
            throw new IllegalArgumentException("constant drag coefficient must be in (0, 0.1), got " + value);
        }
    }

    @Override
    public double dragCoefficient(double windSpeed10m) {
        return Double.isNaN(windSpeed10m) ? Double.NaN : value;
    }

    @Override public String id() { return "constant:" + value; }
    @Override public String name() { return "constant C_D = " + value; }
    @Override public String source() { return "constant drag coefficient chosen by the user"; }
    @Override public double validMinSpeed() { return 0.0; }
    @Override public double validMaxSpeed() { return Double.POSITIVE_INFINITY; }
    @Override public String toString() { return id(); }
}
