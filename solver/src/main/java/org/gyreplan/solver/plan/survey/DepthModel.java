package org.gyreplan.solver.plan.survey;

import org.gyreplan.solver.grid.ScalarField;

/** Water depth at a position, m positive down; NaN on land or where unknown. */
@FunctionalInterface
public interface DepthModel {
    double depthM(double lonDeg, double latDeg);

    /** Bilinear interpolation of a depth field (m, positive down). */
    static DepthModel of(ScalarField depth) { return depth::interpolate; }

    /** No depth information (NaN everywhere). */
    DepthModel UNKNOWN = (lon, lat) -> Double.NaN;
}
