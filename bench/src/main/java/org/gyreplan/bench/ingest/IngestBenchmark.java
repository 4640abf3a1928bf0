package org.gyreplan.bench.ingest;

import org.gyreplan.gisdata.cf.GriddedSeries;
import org.gyreplan.gisdata.cf.VariableMapping;
import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.ekman.EkmanPumping;
import org.gyreplan.solver.ekman.EkmanTransport;
import org.gyreplan.solver.ekman.EquatorialCutoff;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.operators.SphericalOperators;
import org.gyreplan.solver.stress.LargePond1981;
import org.gyreplan.solver.stress.WindStress;

import java.io.IOException;
import java.nio.file.Path;

/**
 * Ingest throughput: streams a gridded wind file one step at a time through {@link GriddedSeries} (decode,
 * latitude flip, units) and computes per step the wind stress (Large &amp; Pond 1981, ρₐ from
 * {@link PhysicalConstants#DEFAULT}), Ekman transport and Ekman pumping with the solver's kernels
 * ({@link WindStress}, {@link EkmanTransport}, {@link SphericalOperators#curl}, {@link EkmanPumping#fromCurl}),
 * accumulating time means. Prints cell-steps per second (per wall second and per CPU second of the computing
 * thread) and checksums that bench/scripts/ingest_numpy.py reproduces independently.
 *
 * <p>Mode {@code single}: one thread reads and computes, like the NumPy reference. Mode {@code readahead}: a
 * second thread reads and decodes step k+1 while step k is computed (two buffers); the arithmetic and its order are
 * the same, so results are bit-identical.
 *
 * <p>Mode {@code inline} (clearly a benchmark-only variant): the same formulas written inline in one pass per
 * row for an all-ocean global grid — Large &amp; Pond drag, Ekman transport, curl with centred differences
 * (periodic in longitude, second-order one-sided at the first and last rows) and pumping — to show the cost of the
 * solver's general masked stencil. Its checksums must agree with the other modes and with NumPy.
 *
 * <pre>usage: IngestBenchmark file.nc [repeats] [single|readahead|inline]</pre>
 */
public final class IngestBenchmark {
    private IngestBenchmark() {}

    private static final java.lang.management.ThreadMXBean MX = java.lang.management.ManagementFactory.getThreadMXBean();

    public static void main(String[] args) throws IOException {
        Path file = Path.of(args[0]);
        int repeats = args.length > 1 ? Integer.parseInt(args[1]) : 1;
        String mode = args.length > 2 ? args[2] : "single";
        for (int r = 0; r < repeats; r++) {
            if (mode.equals("inline")) runInline(file);
            else run(file, mode.equals("readahead"));
        }
    }

    static void run(Path file, boolean readAhead) throws IOException {
        long t0 = System.nanoTime();
        long c0 = processCpuNanos();
        PhysicalConstants pc = PhysicalConstants.DEFAULT;
        EquatorialCutoff cut = EquatorialCutoff.DEFAULT;
        double readNs = 0;
        try (GriddedSeries s = GriddedSeries.openWind(file, VariableMapping.automatic(), null, null, null)) {
            LonLatGrid g = s.grid();
            int n = g.size(), nt = s.size();
            double[][] us = {new double[n], new double[n]}, vs = {new double[n], new double[n]};
            double[] tx = new double[n], ty = new double[n];
            java.util.concurrent.ExecutorService reader = readAhead ? java.util.concurrent.Executors.newSingleThreadExecutor() : null;
            java.util.concurrent.Future<?> next = null;
            if (readAhead && nt > 0) next = reader.submit(() -> { read(s, 0, us[0], vs[0]); return null; });
            double[] ue = new double[n], ve = new double[n], curl = new double[n], w = new double[n];
            long[] phase = new long[4];
            double[] sumW = new double[n], sumTx = new double[n], sumVe = new double[n];
            for (int k = 0; k < nt; k++) {
                double[] u = us[k & 1], v = vs[k & 1];
                if (readAhead) {
                    try {
                        next.get();
                    } catch (InterruptedException | java.util.concurrent.ExecutionException e) {
                        throw new IOException("read-ahead failed at step " + k, e);
                    }
                    if (k + 1 < nt) {
                        final int kk = k + 1;
                        next = reader.submit(() -> { read(s, kk, us[kk & 1], vs[kk & 1]); return null; });
                    }
                } else {
                    long r0 = MX.getCurrentThreadCpuTime();
                    read(s, k, u, v);
                    readNs += MX.getCurrentThreadCpuTime() - r0;
                }
                long p0 = MX.getCurrentThreadCpuTime();
                WindStress.compute(g, u, v, LargePond1981.INSTANCE, pc.rhoAir(), tx, ty);
                long p1 = MX.getCurrentThreadCpuTime();
                EkmanTransport.compute(g, tx, ty, pc, cut, ue, ve);
                long p2 = MX.getCurrentThreadCpuTime();
                SphericalOperators.curl(g, tx, ty, curl);
                long p3 = MX.getCurrentThreadCpuTime();
                EkmanPumping.fromCurl(g, curl, tx, pc, cut, w);
                long p4 = MX.getCurrentThreadCpuTime();
                phase[0] += p1 - p0;
                phase[1] += p2 - p1;
                phase[2] += p3 - p2;
                phase[3] += p4 - p3;
                for (int c = 0; c < n; c++) {
                    sumW[c] += w[c];
                    sumTx[c] += tx[c];
                    sumVe[c] += ve[c];
                }
            }
            if (reader != null) reader.shutdown();
            double secs = (System.nanoTime() - t0) / 1e9;
            double cpu = (processCpuNanos() - c0) / 1e9; // all threads: reader, JIT, GC — like Python's process_time
            double cellSteps = (double) n * nt;
            System.out.printf("java " + (readAhead ? "readahead" : "single") + ": %d x %d cells x %d steps = %.3g cell-steps in %.2f s wall, %.2f s CPU (reading thread-CPU %.2f s, single mode only): "
                            + "%.3g cell-steps/s wall, %.3g per CPU-s%n",
                    g.nx(), g.ny(), nt, cellSteps, secs, cpu, readNs / 1e9, cellSteps / secs, cellSteps / cpu);
            for (int c = 0; c < n; c++) sumVe[c] = Math.abs(sumVe[c]);
            System.out.printf("java checksums: mean tau_x %.9e Pa, mean |V_e| %.9e m2/s, mean w_e %.9e m/s%n",
                    mean(sumTx, nt), mean(sumVe, nt), mean(sumW, nt));
            System.out.printf("java kernel thread-CPU: stress %.2f s, Ekman transport %.2f s, curl %.2f s, pumping %.2f s%n",
                    phase[0] / 1e9, phase[1] / 1e9, phase[2] / 1e9, phase[3] / 1e9);
            Runtime rt = Runtime.getRuntime();
            System.out.printf("java heap: max %d MB, used at end %d MB%n", rt.maxMemory() >> 20, (rt.totalMemory() - rt.freeMemory()) >> 20);
        }
    }

    /** Benchmark-only inline version of the same formulas (see class comment). */
    static void runInline(Path file) throws IOException {
        long t0 = System.nanoTime();
        long c0 = processCpuNanos();
        PhysicalConstants pc = PhysicalConstants.DEFAULT;
        double cutDeg = EquatorialCutoff.DEFAULT.latitudeDeg();
        try (GriddedSeries s = GriddedSeries.openWind(file, VariableMapping.automatic(), null, null, null)) {
            LonLatGrid g = s.grid();
            int nx = g.nx(), ny = g.ny(), n = g.size(), nt = s.size();
            if (Math.abs(nx * g.dLonDeg() - 360) > 1e-6 || ny < 3) throw new IllegalArgumentException("inline mode needs a global grid");
            double[] u = new double[n], v = new double[n], tx = new double[n], ty = new double[n], a = new double[n];
            double[] sumW = new double[n], sumTx = new double[n], sumVe = new double[n];
            double[] inv = new double[ny], bt = new double[ny], dx = new double[ny];
            double dy = g.dy(), rhoA = pc.rhoAir();
            for (int j = 0; j < ny; j++) {
                double lat = g.latDeg(j), f = pc.coriolis(lat);
                boolean cut = Math.abs(lat) < cutDeg;
                inv[j] = cut ? Double.NaN : 1.0 / (pc.rho0() * f);
                bt[j] = cut ? Double.NaN : pc.beta(lat) / (pc.rho0() * f * f);
                dx[j] = g.dx(j);
            }
            for (int k = 0; k < nt; k++) {
                s.readInto(k, 0, u);
                s.readInto(k, 1, v);
                for (int c = 0; c < n; c++) { // stress, Large & Pond (1981)
                    double uc = u[c], vc = v[c], sp = Math.sqrt(uc * uc + vc * vc);
                    double cd = sp < 11.0 ? 1.2e-3 : (0.49 + 0.065 * sp) * 1e-3;
                    double fac = rhoA * cd * sp;
                    tx[c] = fac * uc;
                    ty[c] = fac * vc;
                }
                for (int j = 0; j < ny; j++) {
                    double w = dx[j];
                    for (int i = 0, c = j * nx; i < nx; i++, c++) a[c] = tx[c] * w;
                }
                for (int j = 0; j < ny; j++) {
                    int r = j * nx;
                    double dxj = dx[j], invj = inv[j], btj = bt[j];
                    for (int i = 0; i < nx; i++) {
                        int c = r + i;
                        int e = i + 1 < nx ? c + 1 : r, wv = i > 0 ? c - 1 : r + nx - 1;
                        double dv = 0.5 * (ty[e] - ty[wv]);
                        double du = j == 0 ? 0.5 * (-3 * a[c] + 4 * a[c + nx] - a[c + 2 * nx])
                                : j == ny - 1 ? 0.5 * (3 * a[c] - 4 * a[c - nx] + a[c - 2 * nx])
                                : 0.5 * (a[c + nx] - a[c - nx]);
                        double curl = dv / dxj - du / (dxj * dy);
                        sumW[c] += curl * invj + tx[c] * btj;
                        sumTx[c] += tx[c];
                        sumVe[c] += -tx[c] * invj;
                    }
                }
            }
            double secs = (System.nanoTime() - t0) / 1e9, cpu = (processCpuNanos() - c0) / 1e9;
            double cellSteps = (double) n * nt;
            System.out.printf("java inline: %d x %d cells x %d steps = %.3g cell-steps in %.2f s wall, %.2f s CPU: "
                    + "%.3g cell-steps/s wall, %.3g per CPU-s%n", nx, ny, nt, cellSteps, secs, cpu, cellSteps / secs, cellSteps / cpu);
            for (int c = 0; c < n; c++) sumVe[c] = Math.abs(sumVe[c]);
            System.out.printf("java checksums: mean tau_x %.9e Pa, mean |V_e| %.9e m2/s, mean w_e %.9e m/s%n",
                    mean(sumTx, nt), mean(sumVe, nt), mean(sumW, nt));
        }
    }

    private static long processCpuNanos() {
        return ((com.sun.management.OperatingSystemMXBean) java.lang.management.ManagementFactory.getOperatingSystemMXBean())
                .getProcessCpuTime();
    }

    private static void read(GriddedSeries s, int k, double[] u, double[] v) throws IOException {
        s.readInto(k, 0, u);
        s.readInto(k, 1, v);
    }

    /** Plain mean over cells of the time-mean (finite cells only). */
    static double mean(double[] sum, int nt) {
        double s = 0;
        int c = 0;
        for (double x : sum) if (Double.isFinite(x)) { s += x / nt; c++; }
        return s / c;
    }
}
