package org.gyreplan.solver.grid;

import java.util.Objects;

/**
 * A horizontal vector field as eastward and northward components on the same grid, with the same units.
 * Currents and stress point "toward" (oceanographic convention).
 */
public record VectorField(ScalarField eastward, ScalarField northward) {

    public VectorField {
        Objects.requireNonNull(eastward, "eastward");
        Objects.requireNonNull(northward, "northward");
        if (!eastward.grid().sameGeometry(northward.grid())) {
            throw new IllegalArgumentException("vector components live on different grids");
        }
        if (!eastward.units().equals(northward.units())) {
            throw new IllegalArgumentException("vector components have different units: "
                    + eastward.units() + " vs " + northward.units());
        }
    }

    public LonLatGrid grid() { return eastward.grid(); }
    public String units() { return eastward.units(); }

    /** Magnitude at flat index k. */
    public double magnitude(int k) { return Math.hypot(eastward.values()[k], northward.values()[k]); }
}
