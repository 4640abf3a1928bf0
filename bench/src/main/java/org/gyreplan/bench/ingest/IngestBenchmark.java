package org.gyreplan.bench.ingest;

import org.gyreplan.gisdata.cf.GriddedSeries;
import org.gyreplan.gisdata.cf.VariableMapping;
import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.ekman.EquatorialCutoff;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.gyreplan.solver.stress.LargePond1981;
import org.gyreplan.solver.surface.SurfaceResponse;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Path;

/**
 * Ingest throughput: streams a gridded wind file one step at a time through {@link GriddedSeries} (decode,
 * latitude flip, units) and computes per step, with the solver's {@link SurfaceResponse} (the class the study
 * pipeline calls), the wind stress (Large &amp; Pond 1981, ρₐ from {@link PhysicalConstants#DEFAULT}), stress
 * curl, Ekman transport and Ekman pumping, accumulating time means. Prints cell-steps per second (per wall second
 * and per CPU second of the process) and checksums that bench/scripts/ingest_numpy.py reproduces independently.
 * Everything runs on one thread (the JVM's own JIT and GC threads aside), like the NumPy reference.
 *
 * <p>Modes:
 * <ul>
 *   <li>{@code pipeline}: the calls the study pipeline makes per step — {@code series.read(k)} (new arrays),
 *       {@code response.fromWind(wind)} (new output arrays).</li>
 *   <li>{@code reuse}: the same computation, but the wind is read into two reused buffers with
 *       {@code readInto} and the outputs go into the previous step's arrays with
 *       {@code response.fromWind(wind, previous)} (no per-step allocation).</li>
 * </ul>
 * Both modes give bit-identical results.
 *
 * <pre>usage: IngestBenchmark file.nc [repeats] [pipeline|reuse]</pre>
 */
public final class IngestBenchmark {
    private IngestBenchmark() {}

    private static final ThreadMXBean MX = ManagementFactory.getThreadMXBean();

    public static void main(String[] args) throws IOException {
        Path file = Path.of(args[0]);
        int repeats = args.length > 1 ? Integer.parseInt(args[1]) : 1;
        String mode = args.length > 2 ? args[2] : "pipeline";
        if (!mode.equals("pipeline") && !mode.equals("reuse")) {
            throw new IllegalArgumentException("mode must be pipeline or reuse, got " + mode);
        }
        for (int r = 0; r < repeats; r++) run(file, mode.equals("reuse"));
    }

    static void run(Path file, boolean reuse) throws IOException {
        long t0 = System.nanoTime();
        long c0 = processCpuNanos();
        PhysicalConstants pc = PhysicalConstants.DEFAULT;
        SurfaceResponse response = new SurfaceResponse(LargePond1981.INSTANCE, pc, EquatorialCutoff.DEFAULT);
        long readNs = 0, computeNs = 0;
        try (GriddedSeries s = GriddedSeries.openWind(file, VariableMapping.automatic(), null, null, null)) {
            LonLatGrid g = s.grid();
            int n = g.size(), nt = s.size();
            double[] u = new double[n], v = new double[n];
            double[] sumW = new double[n], sumTx = new double[n], sumVe = new double[n];
            SurfaceResponse.Step step = null;
            for (int k = 0; k < nt; k++) {
                long r0 = MX.getCurrentThreadCpuTime();
                VectorField wind;
                if (reuse) {
                    s.readInto(k, 0, u);
                    s.readInto(k, 1, v);
                    wind = new VectorField(new ScalarField(g, u, "u10", "m s-1", null),
                            new ScalarField(g, v, "v10", "m s-1", null));
                } else {
                    wind = s.read(k).vector();
                }
                long r1 = MX.getCurrentThreadCpuTime();
                step = reuse ? response.fromWind(wind, step) : response.fromWind(wind);
                long r2 = MX.getCurrentThreadCpuTime();
                readNs += r1 - r0;
                computeNs += r2 - r1;
                double[] w = step.ekmanPumping().values(), tx = step.stress().eastward().values();
                double[] ve = step.ekmanTransport().northward().values();
                for (int c = 0; c < n; c++) {
                    sumW[c] += w[c];
                    sumTx[c] += tx[c];
                    sumVe[c] += ve[c];
                }
            }
            double secs = (System.nanoTime() - t0) / 1e9;
            double cpu = (processCpuNanos() - c0) / 1e9; // all threads incl. JIT and GC — like Python's process_time
            double cellSteps = (double) n * nt;
            System.out.printf("java %s: %d x %d cells x %d steps = %.3g cell-steps in %.2f s wall, %.2f s CPU "
                            + "(thread-CPU: read+decode %.2f s, stress/curl/Ekman %.2f s): %.3g cell-steps/s wall, %.3g per CPU-s%n",
                    reuse ? "reuse" : "pipeline", g.nx(), g.ny(), nt, cellSteps, secs, cpu, readNs / 1e9, computeNs / 1e9,
                    cellSteps / secs, cellSteps / cpu);
            for (int c = 0; c < n; c++) sumVe[c] = Math.abs(sumVe[c]);
            System.out.printf("java checksums: mean tau_x %.9e Pa, mean |V_e| %.9e m2/s, mean w_e %.9e m/s%n",
                    mean(sumTx, nt), mean(sumVe, nt), mean(sumW, nt));
            Runtime rt = Runtime.getRuntime();
            System.out.printf("java heap: max %d MB, used at end %d MB%n", rt.maxMemory() >> 20, (rt.totalMemory() - rt.freeMemory()) >> 20);
        }
    }

    private static long processCpuNanos() {
        return ((com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean())
                .getProcessCpuTime();
    }

    /** Plain mean over cells of the time-mean (finite cells only). */
    static double mean(double[] sum, int nt) {
        double s = 0;
        int c = 0;
        for (double x : sum) if (Double.isFinite(x)) { s += x / nt; c++; }
        return s / c;
    }
}
