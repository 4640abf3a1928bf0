package org.gyreplan.solver.gyre;

import org.gyreplan.solver.DegreeTrig;
import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;

/**
 * Metric model of the gyre solvers.
 *
 * <pre>
 *   SPHERE:      Δx_j = R cos φ_j Δλ,   Δy = R Δφ,   β_j = 2Ω cos φ_j / R_E,   flux-form Laplacian with cos φ at faces
 *   BETA_PLANE:  Δx = R cos φ₀ Δλ,      Δy = R Δφ,   β = 2Ω cos φ₀ / R_E (or a given β),  Cartesian Laplacian
 * </pre>
 *
 * R is the grid's radius (m), R_E and Ω come from {@link PhysicalConstants}; φ₀ the reference latitude (degrees).
 * The β-plane is the Cartesian geometry of Stommel (1948) and Munk (1950); the sphere is for real basins.
 */
public final class Geometry {
    /** Kind of metric model. */
    public enum Kind { SPHERE, BETA_PLANE }

    private final Kind kind;
    private final double refLatDeg;
    private final double beta;

    private Geometry(Kind kind, double refLatDeg, double beta) {
        this.kind = kind;
        this.refLatDeg = refLatDeg;
        this.beta = beta;
    }

    /** Spherical metrics, β varying with latitude. */
    public static Geometry sphere() { return new Geometry(Kind.SPHERE, Double.NaN, Double.NaN); }

    /** β-plane at reference latitude φ₀ (degrees), β = 2Ω cos φ₀ / R_E. */
    public static Geometry betaPlane(double refLatDeg) {
        if (!(Math.abs(refLatDeg) < 90)) throw new IllegalArgumentException("β-plane reference latitude must lie in (−90°, 90°), got " + refLatDeg);
        return new Geometry(Kind.BETA_PLANE, refLatDeg, Double.NaN);
    }

    /** β-plane at reference latitude φ₀ (degrees, sets Δx) with an explicit β (m⁻¹ s⁻¹, &gt; 0). */
    public static Geometry betaPlane(double refLatDeg, double betaPerMeterSecond) {
        if (!(Math.abs(refLatDeg) < 90)) throw new IllegalArgumentException("β-plane reference latitude must lie in (−90°, 90°), got " + refLatDeg);
        if (!(betaPerMeterSecond > 0)) throw new IllegalArgumentException("β must be positive, got " + betaPerMeterSecond);
        return new Geometry(Kind.BETA_PLANE, refLatDeg, betaPerMeterSecond);
    }

    public Kind kind() { return kind; }
    /** Reference latitude φ₀ of a β-plane, degrees (NaN on the sphere). */
    public double refLatDeg() { return refLatDeg; }

    /** β at grid row j, m⁻¹ s⁻¹. */
    public double beta(LonLatGrid g, int j, PhysicalConstants pc) {
        if (kind == Kind.SPHERE) return pc.beta(g.latDeg(j));
        return Double.isNaN(beta) ? pc.beta(refLatDeg) : beta;
    }

    /** cos φ used by the metrics at latitude latDeg (1 on the β-plane). */
    double cosFactor(double latDeg) {
        if (kind == Kind.BETA_PLANE) return 1.0;
        return Math.max(0.0, DegreeTrig.cosDeg(latDeg));
    }

    /** R Δλ cos φ₀ on the β-plane, R Δλ on the sphere (to be multiplied by {@link #cosFactor}), m. */
    double dxUnit(LonLatGrid g) {
        double base = g.radius() * Math.toRadians(g.dLonDeg());
        return kind == Kind.BETA_PLANE ? base * DegreeTrig.cosDeg(refLatDeg) : base;
    }

    /** Zonal spacing at grid row j, m. */
    public double dx(LonLatGrid g, int j) { return dxUnit(g) * cosFactor(g.latDeg(j)); }

    /** Meridional spacing, m. */
    public double dy(LonLatGrid g) { return g.radius() * Math.toRadians(g.dLatDeg()); }

    @Override
    public String toString() {
        return kind == Kind.SPHERE ? "sphere" : "β-plane at " + refLatDeg + "°" + (Double.isNaN(beta) ? "" : " (β = " + beta + " m⁻¹ s⁻¹)");
    }
}
