package org.gyreplan.app.pipeline;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.atmos.GeostrophicWind;
import org.gyreplan.solver.ekman.EkmanPumping;
import org.gyreplan.solver.ekman.EkmanTransport;
import org.gyreplan.solver.gyre.BoundaryLayerScales;
import org.gyreplan.solver.stress.DragLaws;
import org.gyreplan.solver.stress.WindStress;
import org.gyreplan.solver.upwelling.CoastalUpwellingIndex;
import org.gyreplan.solver.upwelling.SeaLevelPressureIndex;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleSupplier;

/**
 * Built-in verification: each case computes a quantity with the solver and compares it with a value from outside
 * the project (an analytic solution, a published table, or arithmetic from a published formula). Used by
 * {@code gyreplan verify} and shown by the desktop app. The cases hold inputs and expected values only; the
 * computation is always the solver's.
 */
public final class Verification {
    private Verification() {}

    /**
     * One check.
     *
     * @param id        short id, e.g. {@code ROT-45-f}
     * @param what      quantity and inputs in words
     * @param source    where the expected value comes from (author, year, what)
     * @param expected  expected value (in {@code units})
     * @param tolerance allowed difference: relative if {@code relative}, else absolute (in {@code units})
     * @param relative  whether the tolerance is relative
     * @param units     unit of expected and got
     * @param compute   computes the value with the solver
     */
    public record Case(String id, String what, String source, double expected, double tolerance, boolean relative,
                       String units, DoubleSupplier compute) {
        public Outcome evaluate() {
            double got;
            try {
                got = compute.getAsDouble();
            } catch (RuntimeException e) {
                return new Outcome(this, Double.NaN, false, e.getClass().getSimpleName() + ": " + e.getMessage());
            }
            double diff = Math.abs(got - expected);
            double allowed = relative ? tolerance * Math.abs(expected) : tolerance;
            return new Outcome(this, got, Double.isFinite(got) && diff <= allowed, null);
        }
    }

    /** The result of one case; {@code error} is set when the computation threw. */
    public record Outcome(Case c, double got, boolean pass, String error) {}

    /** Every built-in case, grouped by topic. */
    public static List<Case> cases() {
        List<Case> list = new ArrayList<>();
        rotation(list);
        drag(list);
        ekman(list);
        pumping(list);
        geostrophic(list);
        upwelling(list);
        boundaryLayers(list);
        return list;
    }

    private static void rotation(List<Case> l) {
        PhysicalConstants k = PhysicalConstants.DEFAULT;
        String src = "Stewart, Introduction to Physical Oceanography, eqs. 7.10 and 11.7 (f = 2Ω sin φ, β = 2Ω cos φ / R),"
                + " Ω = 7.292115e-5 s⁻¹ (WGS 84), R = 6.371e6 m";
        double[][] rows = {{15, 3.774676e-5, 2.211157e-11}, {30, 7.292115e-5, 1.982470e-11},
                {45, 1.031261e-4, 1.618680e-11}, {60, 1.263031e-4, 1.144579e-11}, {-25, -6.163562e-5, 2.074682e-11}};
        for (double[] r : rows) {
            double lat = r[0];
            String tag = (lat < 0 ? "S" : "") + (int) Math.abs(lat);
            l.add(new Case("ROT-" + tag + "-f", "Coriolis parameter f at " + fmtLat(lat), src, r[1], 1e-6, true, "s-1",
                    () -> k.coriolis(lat)));
            l.add(new Case("ROT-" + tag + "-beta", "β at " + fmtLat(lat), src, r[2], 1e-6, true, "m-1 s-1",
                    () -> k.beta(lat)));
        }
        l.add(new Case("ROT-EQ-f", "f exactly zero at the equator", "definition (sin 0° = 0)", 0.0, 0.0, false, "s-1",
                () -> k.coriolis(0.0)));
        l.add(new Case("ROT-45-T", "inertial period 2π/|f| at 45°N", src, 16.924, 1e-4, true, "h",
                () -> k.inertialPeriod(45.0) / 3600.0));
    }

    private static void drag(List<Case> l) {
        String lp = "Large & Pond (1981), J. Phys. Oceanogr. 11, 324-336: 10³C_D = 1.2 (4-11 m/s), 0.49 + 0.065U (11-25 m/s)";
        l.add(new Case("DRAG-LP81-8", "C_D Large & Pond (1981) at 8 m/s", lp, 1.2e-3, 1e-9, true, "1",
                () -> DragLaws.byName("large-pond-1981").dragCoefficient(8.0)));
        l.add(new Case("DRAG-LP81-15", "C_D Large & Pond (1981) at 15 m/s", lp, 1.465e-3, 1e-9, true, "1",
                () -> DragLaws.byName("large-pond-1981").dragCoefficient(15.0)));
        l.add(new Case("DRAG-LY04-10", "C_D Large & Yeager (2004) at 10 m/s",
                "Large & Yeager (2004), NCAR TN-460: 10³C_D = 2.7/U + 0.142 + U/13.09", 1.17594194e-3, 1e-6, true, "1",
                () -> DragLaws.byName("large-yeager-2004").dragCoefficient(10.0)));
        l.add(new Case("DRAG-TAU-10", "τ for 10 m/s, C_D 1.3e-3, ρₐ 1.22",
                "bulk formula τ = ρₐ C_D U² (common practice); CHECKS UI-05 τ = 0.1586 N/m²", 0.1586, 1e-4, true, "Pa",
                () -> WindStress.of(0.0, -10.0, DragLaws.constant(1.3e-3), 1.22).magnitudePa()));
    }

    private static void ekman(List<Case> l) {
        PhysicalConstants k = PhysicalConstants.DEFAULT;
        String src = "Ekman (1905) transport Vₑ = −τₓ/(ρ₀f), Stewart ch. 9; ρ₀ = 1025, f(45°N) = 1.031261e-4";
        l.add(new Case("EK-45-V", "northward Ekman transport for τₓ = 0.1 Pa at 45°N", src, -0.946040, 1e-5, true, "m2 s-1",
                () -> EkmanTransport.of(0.1, 0.0, 45.0, k).northward()));
        l.add(new Case("EK-S25-U", "eastward Ekman transport for τᵧ = 0.1 Pa at 25°S (left of the stress)",
                "Uₑ = τᵧ/(ρ₀f), f(25°S) = −6.163562e-5 (CHECKS ROT-S25)", -1.582874, 1e-5, true, "m2 s-1",
                () -> EkmanTransport.of(0.0, 0.1, -25.0, k).eastward()));
    }

    private static void pumping(List<Case> l) {
        PhysicalConstants k = PhysicalConstants.DEFAULT;
        String src = "wₑ = curl τ/(ρ₀f) + βτₓ/(ρ₀f²), Stewart ch. 9 and 12 (sign: upward positive); CHECKS EP-01, EP-03";
        l.add(new Case("EP-01", "pumping for curl τ = 1e-7 N/m³ at 30°N", src, 1.3379e-6, 1e-4, true, "m s-1",
                () -> EkmanPumping.of(1e-7, 0.0, 30.0, k)));
        l.add(new Case("EP-03", "β term only, τₓ = 0.1 Pa at 30°N", src, 3.6373e-7, 1e-4, true, "m s-1",
                () -> EkmanPumping.of(0.0, 0.1, 30.0, k)));
    }

    private static void geostrophic(List<Case> l) {
        PhysicalConstants k = PhysicalConstants.DEFAULT;
        String src = "V_g = |∇p|/(ρₐ|f|) (Holton ch. 3; AMS Glossary); CHECKS GEO-04";
        l.add(new Case("GEO-04", "geostrophic wind for 1 hPa per 100 km at 36°N, ρₐ 1.22", src, 9.5618, 1e-5, true, "m s-1",
                () -> GeostrophicWind.of(-1e-3, 0.0, 36.0, k).speed()));
    }

    private static void upwelling(List<Case> l) {
        PhysicalConstants k = PhysicalConstants.DEFAULT;
        l.add(new Case("UI-06-36", "coastal index, 0.1 Pa equatorward stress, N-S coast, ocean west, 36°N",
                "Bakun (1973) index: offshore Ekman transport per 100 m of coast (from memory); CHECKS UI-06", 113.81, 1e-4, true,
                "m3 s-1 per 100 m", () -> CoastalUpwellingIndex.defaults().withConstants(k).fromStress(0.0, -0.1, 36.0, 270.0)));
        l.add(new Case("UI-01", "index from pressure: ∂p/∂x = −1 hPa/100 km, 36°N (0.7, 15°, C_D 1.3e-3)",
                "Bakun (1973) method as summarised in CHECKS 4a (parameters from memory); CHECKS UI-01", 78.108, 1e-4, true,
                "m3 s-1 per 100 m", () -> SeaLevelPressureIndex.classic().fromGradient(-1e-3, 0.0, 36.0, 270.0)));
    }

    private static void boundaryLayers(List<Case> l) {
        l.add(new Case("ST-01", "Stommel layer width r/β, r = 1e-6 s⁻¹, β = 1e-11 m⁻¹s⁻¹",
                "Stommel (1948) parameters (from memory); CHECKS ST-01", 1.0e5, 1e-9, true, "m",
                () -> BoundaryLayerScales.stommelWidth(1e-6, 1e-11)));
        l.add(new Case("MU-07", "Munk layer width (A_H/β)^(1/3), A_H = 5e3, β(30°N)",
                "Munk (1950); CHECKS MU-07", 63.18e3, 1e-3, true, "m",
                () -> BoundaryLayerScales.munkWidth(5e3, PhysicalConstants.DEFAULT.beta(30.0))));
    }

    private static String fmtLat(double lat) {
        return String.format(Locale.ROOT, "%.0f°%s", Math.abs(lat), lat < 0 ? "S" : "N");
    }

    /** A fixed-width table: case, source, expected, got, tolerance, pass. */
    public static String table(List<Outcome> results) {
        StringBuilder sb = new StringBuilder();
        String fmt = "%-16s %-46s %14s %14s %11s  %-4s%n";
        sb.append(String.format(Locale.ROOT, fmt, "case", "what", "expected", "got", "tolerance", "pass"));
        sb.append("-".repeat(112)).append('\n');
        for (Outcome o : results) {
            Case c = o.c();
            String tol = c.relative() ? String.format(Locale.ROOT, "rel %.0e", c.tolerance())
                    : String.format(Locale.ROOT, "%.2g", c.tolerance());
            sb.append(String.format(Locale.ROOT, fmt, c.id(), cut(c.what(), 46), num(c.expected()),
                    o.error() != null ? "error" : num(o.got()), tol, o.pass() ? "yes" : "NO"));
        }
        sb.append("\nSources:\n");
        List<String> seen = new ArrayList<>();
        for (Outcome o : results) {
            String key = o.c().id().replaceAll("-.*", "");
            String line = "  " + key + ": " + o.c().source();
            if (!seen.contains(line)) { seen.add(line); sb.append(line).append('\n'); }
        }
        for (Outcome o : results) if (o.error() != null) sb.append("  error in ").append(o.c().id()).append(": ").append(o.error()).append('\n');
        return sb.toString();
    }

    private static String cut(String s, int n) { return s.length() <= n ? s : s.substring(0, n - 1) + "…"; }

    private static String num(double v) {
        if (!Double.isFinite(v)) return String.valueOf(v);
        if (v == 0) return "0";
        double a = Math.abs(v);
        return a >= 1e-3 && a < 1e5 ? String.format(Locale.ROOT, "%.6g", v) : String.format(Locale.ROOT, "%.6e", v);
    }
}
