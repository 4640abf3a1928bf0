package org.gyreplan.app.pipeline;

import org.gyreplan.solver.PhysicalConstants;

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
