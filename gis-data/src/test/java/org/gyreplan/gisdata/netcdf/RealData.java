package org.gyreplan.gisdata.netcdf;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

import static org.junit.jupiter.api.Assertions.fail;

/**
 * Locates the open datasets and runs the real clients (ncdump, nccopy, gdalinfo) for tests. A missing dataset
 * or tool FAILS the test with a clear message (tools/fetch-test-deps.sh installs them), never passes silently.
 */
public final class RealData {
    private RealData() {}

    /** The folder of the NOAA open datasets (Debian ferret-datasets), from $GYREPLAN_DATA_CACHE. */
    public static Path dataDir() {
        String cache = System.getenv("GYREPLAN_DATA_CACHE");
        Path base = cache != null && !cache.isBlank() ? Path.of(cache) : Path.of(System.getProperty("user.home"), ".cache", "gyreplan");
        return base.resolve("ferret-datasets/usr/share/ferret-vis/data");
    }

    /** A dataset file; fails the test if absent. */
    public static Path file(String name) {
        Path p = dataDir().resolve(name);
        if (!Files.isRegularFile(p)) {
            fail("open dataset " + p + " is missing; run tools/fetch-test-deps.sh (Debian ferret-datasets)");
        }
        return p;
    }

    /** Runs a command, returns stdout; fails the test if the tool is missing or exits non-zero. */
    public static String run(String... cmd) {
        try {
            ProcessBuilder pb = new ProcessBuilder(cmd).redirectErrorStream(true);
            Process p;
            try {
                p = pb.start();
            } catch (IOException e) {
                fail("tool '" + cmd[0] + "' is not installed (run tools/fetch-test-deps.sh: gdal-bin, netcdf-bin): " + e.getMessage());
                return null;
            }
            byte[] out = p.getInputStream().readAllBytes();
            if (!p.waitFor(60, TimeUnit.SECONDS)) {
                p.destroyForcibly();
                fail(String.join(" ", cmd) + " timed out");
            }
            String s = new String(out, StandardCharsets.UTF_8);
            if (p.exitValue() != 0) fail(String.join(" ", cmd) + " failed (" + p.exitValue() + "):\n" + s);
            return s;
        } catch (IOException | InterruptedException e) {
            throw new AssertionError(e);
        }
    }

    /**
     * All values of one variable as printed by {@code ncdump -v var file} (row-major; "_" → NaN).
     */
    public static double[] ncdumpValues(Path file, String var) {
        return CACHE.computeIfAbsent(file.toAbsolutePath() + "#" + var, k -> parseNcdump(file, var)).clone();
    }

    private static final java.util.Map<String, double[]> CACHE = new java.util.concurrent.ConcurrentHashMap<>();

    private static double[] parseNcdump(Path file, String var) {
        String out = run("ncdump", "-v", var, file.toString());
        int data = out.indexOf("\ndata:");
        int at = out.indexOf("\n " + var + " =", data);
        if (at < 0) fail("ncdump printed no data for " + var);
        int end = out.indexOf(';', at);
        int from = out.indexOf('=', at) + 1;
        double[] a = new double[1024];
        int n = 0, i = from;
        while (i < end) {
            char c = out.charAt(i);
            if (c == ',' || c == ' ' || c == '\n' || c == '\t') { i++; continue; }
            int j = i;
            while (j < end && out.charAt(j) != ',' && !Character.isWhitespace(out.charAt(j))) j++;
            if (n == a.length) a = java.util.Arrays.copyOf(a, 2 * n);
            a[n++] = (j == i + 1 && c == '_') ? Double.NaN : Double.parseDouble(out.substring(i, j));
            i = j;
        }
        a = java.util.Arrays.copyOf(a, n);
        return a;
    }
}
