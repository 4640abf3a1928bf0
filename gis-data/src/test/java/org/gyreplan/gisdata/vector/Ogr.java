package org.gyreplan.gisdata.vector;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.junit.jupiter.api.Assertions.fail;

/**
 * Runs GDAL's command-line clients (Debian gdal-bin: ogrinfo, ogr2ogr) as independent readers of our files.
 * A missing tool fails the test with a clear message (tools/fetch-test-deps.sh installs it).
 */
public final class Ogr {
    private Ogr() {}

    /** Output of a finished command: exit code, stdout, stderr. */
    public record Run(int exit, String out, String err) {}

    public static Run run(String... command) throws IOException, InterruptedException {
        String[] dirs = command[0].startsWith("/") ? new String[] {"/"}
                : System.getenv().getOrDefault("PATH", "/usr/bin").split(":");
        for (String dir : dirs) {
            if (Files.isExecutable(Path.of(dir, command[0]))) {
                Process p = new ProcessBuilder(command).redirectInput(ProcessBuilder.Redirect.from(new java.io.File("/dev/null"))).start();
                byte[] err;
                byte[] out = p.getInputStream().readAllBytes();
                err = p.getErrorStream().readAllBytes();
                int exit = p.waitFor();
                return new Run(exit, new String(out, StandardCharsets.UTF_8), new String(err, StandardCharsets.UTF_8));
            }
        }
        fail(command[0] + " not found on PATH; install Debian's gdal-bin (tools/fetch-test-deps.sh) to run the GDAL checks");
        return null;
    }

    /** One layer of {@code ogrinfo -al -so} output. */
    public record Layer(String name, String geometry, long featureCount, double[] extent, String srs, String text) {}

    /** Runs {@code ogrinfo -al -so} and parses one summary per layer; fails if ogrinfo fails. */
    public static Map<String, Layer> summary(Path file) throws IOException, InterruptedException {
        Run r = run("ogrinfo", "-ro", "-al", "-so", file.toString());
        if (r.exit() != 0) fail("ogrinfo failed on " + file + ": " + r.err() + r.out());
        Map<String, Layer> out = new LinkedHashMap<>();
        String[] blocks = r.out().split("\nLayer name: ");
        for (int k = 1; k < blocks.length; k++) {
            String b = blocks[k];
            String name = b.substring(0, b.indexOf('\n')).trim();
            out.put(name, new Layer(name, field(b, "Geometry: (.*)"), Long.parseLong(field(b, "Feature Count: (\\d+)")),
                    extent(b), b.contains("SRS WKT:") ? b.substring(b.indexOf("SRS WKT:")) : "", b));
        }
        return out;
    }

    private static String field(String b, String regex) {
        Matcher m = Pattern.compile(regex).matcher(b);
        return m.find() ? m.group(1).trim() : null;
    }

    private static double[] extent(String b) {
        Matcher m = Pattern.compile("Extent: \\(([-0-9.]+), ([-0-9.]+)\\) - \\(([-0-9.]+), ([-0-9.]+)\\)").matcher(b);
        if (!m.find()) return null;
        return new double[] {Double.parseDouble(m.group(1)), Double.parseDouble(m.group(2)),
                Double.parseDouble(m.group(3)), Double.parseDouble(m.group(4))};
    }

    /** Runs {@code ogrinfo -al} (full feature dump); fails if ogrinfo fails. */
    public static Run dump(Path file) throws IOException, InterruptedException {
        Run r = run("ogrinfo", "-ro", "-al", file.toString());
        if (r.exit() != 0) fail("ogrinfo failed on " + file + ": " + r.err() + r.out());
        return r;
    }

    /** The geometries of an {@code ogrinfo -al} dump, parsed from their WKT lines, in order. */
    public static List<org.locationtech.jts.geom.Geometry> geometries(String dump) {
        List<org.locationtech.jts.geom.Geometry> out = new ArrayList<>();
        org.locationtech.jts.io.WKTReader r = new org.locationtech.jts.io.WKTReader();
        for (String line : dump.split("\n")) {
            String t = line.trim();
            if (line.startsWith("  ") && t.matches("(MULTI)?(POINT|LINESTRING|POLYGON) .*")) {
                try {
                    out.add(r.read(t));
                } catch (org.locationtech.jts.io.ParseException e) {
                    fail("ogrinfo printed unreadable WKT: " + t);
                }
            }
        }
        return out;
    }

    /** Lines of a dump that hold attribute values, e.g. {@code "  name (String) = Zone A"}. */
    public static List<String> attributeLines(String dump) {
        List<String> out = new ArrayList<>();
        for (String line : dump.split("\n")) if (line.matches("\\s+\\S.* \\(\\w+(\\(\\w+\\))?\\) = .*")) out.add(line.trim());
        return out;
    }
}
