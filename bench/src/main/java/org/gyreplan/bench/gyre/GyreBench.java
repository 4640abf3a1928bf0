package org.gyreplan.bench.gyre;

import org.gyreplan.gisdata.io.AtomicWrite;
import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.gyre.Geometry;
import org.gyreplan.solver.gyre.GyreProblem;
import org.gyreplan.solver.gyre.GyreSolution;
import org.gyreplan.solver.gyre.GyreSolver;
import org.gyreplan.solver.gyre.WallCondition;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Path;
import java.util.Arrays;

/**
 * Benchmark of the gyre solver on the square β-plane basin that {@code bench/scripts/gyre_scipy.py} builds with
 * scipy.sparse (same discretisation): L = 4000 km, n × n ocean cells inside one ring of land, β = 2e-11 m⁻¹ s⁻¹,
 * curl τ = −1e-7 sin(πy/L) N m⁻³, ρ₀ = 1025 kg m⁻³; Stommel r = β·40 km, Munk A_H = β·(40 km)³ with no-slip walls.
 *
 * <pre>
 *   java -cp ... org.gyreplan.bench.gyre.GyreBench stommel|munk|both N THREADS REPS [psi-output.f64]
 * </pre>
 *
 * Prints one line per repetition (wall time of problem set-up plus solve, iterations, levels) and the best time;
 * writes ψ (m³ s⁻¹, little-endian float64, n × n ocean cells row-major, south row first) if a path is given.
 */
public final class GyreBench {
    static final double L = 4e6, BETA = 2e-11, DELTA = 40e3, RADIUS = PhysicalConstants.EARTH_RADIUS_MEAN;

    private GyreBench() { }

    static GyreProblem problem(String kind, int n, int threads) {
        double h = L / (n + 1);
        double dDeg = Math.toDegrees(h / RADIUS);
        int nx = n + 2;
        boolean[] ocean = new boolean[nx * nx];
        for (int j = 1; j <= n; j++) for (int i = 1; i <= n; i++) ocean[j * nx + i] = true;
        LonLatGrid g = new LonLatGrid(nx, nx, 0, -(nx - 1) / 2.0 * dDeg, dDeg, dDeg, RADIUS, ocean);
        double[] c = new double[nx * nx];
        for (int j = 0; j < nx; j++) {
            double v = -1e-7 * Math.sin(Math.PI * j * h / L);
            for (int i = 0; i < nx; i++) c[j * nx + i] = v;
        }
        ScalarField curl = new ScalarField(g, c, "wind_stress_curl", "N m-3", "wind-stress curl");
        GyreProblem.Builder b = GyreProblem.on(g).curl(curl).depth(1000).geometry(Geometry.betaPlane(0, BETA))
                .options(GyreProblem.Options.defaults().withThreads(threads));
        switch (kind) {
            case "stommel" -> b.stommel(BETA * DELTA);
            case "munk" -> b.munk(BETA * DELTA * DELTA * DELTA, WallCondition.NO_SLIP);
            case "munkfree" -> b.munk(BETA * DELTA * DELTA * DELTA, WallCondition.FREE_SLIP);
            case "both" -> b.stommel(BETA * DELTA).munk(BETA * DELTA * DELTA * DELTA, WallCondition.NO_SLIP);
            default -> throw new IllegalArgumentException("case must be stommel, munk or both: " + kind);
        }
        return b.build();
    }

    public static void main(String[] args) throws Exception {
        if (args.length < 4) {
            System.err.println("usage: GyreBench stommel|munk|both N THREADS REPS [psi-output.f64]");
            System.exit(2);
        }
        String kind = args[0];
        int n = Integer.parseInt(args[1]), threads = Integer.parseInt(args[2]), reps = Integer.parseInt(args[3]);
        double best = Double.POSITIVE_INFINITY, bestCpu = Double.POSITIVE_INFINITY;
        GyreSolution sol = null;
        for (int r = 0; r < reps; r++) {
            var os = (com.sun.management.OperatingSystemMXBean) java.lang.management.ManagementFactory.getOperatingSystemMXBean();
            long c0 = os.getProcessCpuTime();
            long t0 = System.nanoTime();
            GyreProblem p = problem(kind, n, threads);
            ProgressListener listener = ProgressListener.NONE;
            if (System.getenv("GYRE_BENCH_VERBOSE") != null) {
                listener = (stage, f, msg) -> System.out.printf("  %.3f s  %s %.3f %s%n", (System.nanoTime() - t0) / 1e9, stage, f, msg);
            }
            sol = GyreSolver.solve(p, listener, CancelToken.none());
            double t = (System.nanoTime() - t0) / 1e9;
            double cpu = (os.getProcessCpuTime() - c0) / 1e9;
            best = Math.min(best, t);
            bestCpu = Math.min(bestCpu, cpu);
            System.out.printf("rep %d: %s n=%d threads=%d time=%.3f s cpu=%.3f s iterations=%s levels=%d residual=%.2e%n", r, kind, n,
                    threads, t, cpu, Arrays.toString(sol.stats().iterations()), sol.stats().levels(), sol.stats().relativeResiduals()[0]);
        }
        System.out.printf("best_seconds=%.4f%n", best);
        System.out.printf("best_cpu_seconds=%.4f%n", bestCpu);
        System.out.printf("peak_wbc_Sv=%.6f%n", sol.diagnostics().peakTransportSv());
        if (args.length > 4) {
            double[] v = sol.streamfunction().values();
            int nx = n + 2;
            ByteBuffer buf = ByteBuffer.allocate(n * n * 8).order(ByteOrder.LITTLE_ENDIAN);
            for (int j = 1; j <= n; j++) for (int i = 1; i <= n; i++) buf.putDouble(v[j * nx + i] * 1e6);
            AtomicWrite.write(Path.of(args[4]), out -> out.write(buf.array()));
        }
    }
}
