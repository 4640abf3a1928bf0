package org.gyreplan.solver.gyre;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;

import java.util.Objects;

/**
 * A steady wind-driven barotropic circulation problem on a masked basin.
 *
 * <pre>
 *   r ∇²ψ + β ∂ψ/∂x − A_H ∇⁴ψ = curl_z τ / ρ₀        on the main basin
 *   ψ = 0 on the outer coast; ψ = const on each island (island rule); ∂ψ/∂n = 0 (no-slip) or ∇²ψ = 0 (free-slip)
 *   V = ∂ψ/∂x (northward transport, m² s⁻¹), U = −∂ψ/∂y (eastward)
 * </pre>
 *
 * @param grid         grid with the ocean mask (the main basin is its largest 4-connected ocean component)
 * @param curl         wind-stress curl curl_z τ, N m⁻³ (or {@code null} when {@code stress} is given)
 * @param stress       surface wind stress, Pa (or {@code null} when {@code curl} is given)
 * @param constants    Ω, Earth radius (for β) and ρ₀
 * @param drag         linear bottom-drag rate r on the transport form (Stommel 1948), s⁻¹ (≥ 0)
 * @param viscosity    lateral (Munk 1950) viscosity A_H, m² s⁻¹ (≥ 0)
 * @param wall         wall condition, required when A_H &gt; 0, {@code null} otherwise
 * @param depth        depth H used to turn transports into depth-mean speeds, m (&gt; 0)
 * @param geometry     spherical or β-plane metrics
 * @param options      numerical options
 */
public record GyreProblem(LonLatGrid grid, ScalarField curl, VectorField stress, PhysicalConstants constants,
                          double drag, double viscosity, WallCondition wall, double depth, Geometry geometry,
                          Options options) {

    /**
     * Numerical options.
     *
     * @param tolerance     relative residual of the linear solve (default 1e-9; the true residual must reach 10·tolerance)
     * @param maxIterations iteration limit of the Krylov solver (default 200)
     * @param threads       worker threads (results do not depend on it); default: available processors
     * @param maxIslands    refuse (with a clear message) basins with more islands than this (default 32)
     */
    public record Options(double tolerance, int maxIterations, int threads, int maxIslands) {
        public static Options defaults() {
            return new Options(1e-9, 200, Math.max(1, Runtime.getRuntime().availableProcessors()), 32);
        }
        public Options {
            if (!(tolerance > 0 && tolerance < 1)) throw new IllegalArgumentException("tolerance must lie in (0, 1), got " + tolerance);
            if (maxIterations < 1) throw new IllegalArgumentException("maxIterations must be ≥ 1");
            if (threads < 1) throw new IllegalArgumentException("threads must be ≥ 1");
            if (maxIslands < 0) throw new IllegalArgumentException("maxIslands must be ≥ 0");
        }
        public Options withThreads(int t) { return new Options(tolerance, maxIterations, t, maxIslands); }
        public Options withTolerance(double t) { return new Options(t, maxIterations, threads, maxIslands); }
        public Options withMaxIslands(int m) { return new Options(tolerance, maxIterations, threads, m); }
    }

    public GyreProblem {
        Objects.requireNonNull(grid, "grid");
        Objects.requireNonNull(constants, "constants");
        Objects.requireNonNull(geometry, "geometry");
        Objects.requireNonNull(options, "options");
        if ((curl == null) == (stress == null)) {
            throw new GyreException(GyreException.Reason.BAD_FORCING,
                    "give exactly one forcing: the wind-stress curl (N m-3) or the wind stress (Pa)");
        }
        if (curl != null) {
            if (!curl.grid().sameGeometry(grid)) throw new GyreException(GyreException.Reason.BAD_FORCING,
                    "field '" + curl.name() + "' is not on the problem grid");
            if (!"N m-3".equals(curl.units())) throw new GyreException(GyreException.Reason.BAD_FORCING,
                    "field '" + curl.name() + "': expected wind-stress curl in 'N m-3', got '" + curl.units() + "'");
        }
        if (stress != null) {
            if (!stress.grid().sameGeometry(grid)) throw new GyreException(GyreException.Reason.BAD_FORCING,
                    "wind stress is not on the problem grid");
            if (!"Pa".equals(stress.units()) && !"N m-2".equals(stress.units())) throw new GyreException(GyreException.Reason.BAD_FORCING,
                    "wind stress: expected units 'Pa' (N m-2), got '" + stress.units() + "'");
        }
        if (!(drag >= 0) || Double.isInfinite(drag)) throw bad("bottom-drag rate r must be ≥ 0 s-1, got " + drag);
        if (!(viscosity >= 0) || Double.isInfinite(viscosity)) throw bad("lateral viscosity A_H must be ≥ 0 m2 s-1, got " + viscosity);
        if (drag == 0 && viscosity == 0) throw bad("give a bottom-drag rate r > 0 (Stommel) or a lateral viscosity A_H > 0 (Munk), or both");
        if (viscosity > 0 && wall == null) throw bad("lateral viscosity A_H > 0 needs an explicit wall condition (NO_SLIP or FREE_SLIP)");
        if (viscosity == 0 && wall != null) throw bad("a wall condition was given but A_H = 0 (Stommel drag only): remove it or set A_H");
        if (!(depth > 0) || Double.isInfinite(depth)) throw bad("depth H must be > 0 m, got " + depth);
    }

    private static GyreException bad(String msg) {
        return new GyreException(GyreException.Reason.BAD_PARAMETER, msg);
    }

    /** Starts a builder for a problem on the given grid (mask included). */
    public static Builder on(LonLatGrid grid) { return new Builder(grid); }

    /** Fluent construction; {@link #build()} checks every choice that matters (no silent wall-condition default). */
    public static final class Builder {
        private final LonLatGrid grid;
        private ScalarField curl;
        private VectorField stress;
        private PhysicalConstants constants = PhysicalConstants.DEFAULT;
        private double drag;
        private double viscosity;
        private WallCondition wall;
        private double depth = Double.NaN;
        private Geometry geometry = Geometry.sphere();
        private Options options = Options.defaults();

        private Builder(LonLatGrid grid) { this.grid = grid; }

        /** Forcing by the wind-stress curl, N m⁻³. */
        public Builder curl(ScalarField c) { this.curl = c; return this; }
        /** Forcing by the wind stress, Pa (its curl is computed with the grid metrics). */
        public Builder stress(VectorField s) { this.stress = s; return this; }
        public Builder constants(PhysicalConstants pc) { this.constants = pc; return this; }
        /** Stommel linear drag rate r, s⁻¹. */
        public Builder stommel(double r) { this.drag = r; return this; }
        /** Munk lateral viscosity A_H (m² s⁻¹) and the wall condition (required). */
        public Builder munk(double aH, WallCondition w) { this.viscosity = aH; this.wall = w; return this; }
        /** Depth H for speeds, m. */
        public Builder depth(double h) { this.depth = h; return this; }
        public Builder geometry(Geometry g) { this.geometry = g; return this; }
        public Builder options(Options o) { this.options = o; return this; }

        public GyreProblem build() {
            if (Double.isNaN(depth)) throw new GyreException(GyreException.Reason.BAD_PARAMETER,
                    "depth H (m) is required to report boundary-current speeds");
            return new GyreProblem(grid, curl, stress, constants, drag, viscosity, wall, depth, geometry, options);
        }
    }
}
