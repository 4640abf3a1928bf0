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
 * <pre>usage: IngestBenchmark file.nc [repeats] [single|readahead]</pre>
 */
public final class IngestBenchmark {
    private IngestBenchmark() {}

    private static final java.lang.management.ThreadMXBean MX = java.lang.management.ManagementFactory.getThreadMXBean();

    public static void main(String[] args) throws IOException {
        Path file = Path.of(args[0]);
        int repeats = args.length > 1 ? Integer.parseInt(args[1]) : 1;
        boolean ahead = args.length > 2 && args[2].equals("readahead");
        for (int r = 0; r < repeats; r++) run(file, ahead);
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
                WindStress.compute(g, u, v, LargePond1981.INSTANCE, pc.rhoAir(), tx, ty);
                EkmanTransport.compute(g, tx, ty, pc, cut, ue, ve);
                SphericalOperators.curl(g, tx, ty, curl);
                EkmanPumping.fromCurl(g, curl, tx, pc, cut, w);
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
            Runtime rt = Runtime.getRuntime();
            System.out.printf("java heap: max %d MB, used at end %d MB%n", rt.maxMemory() >> 20, (rt.totalMemory() - rt.freeMemory()) >> 20);
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
