package org.gyreplan.bench.ingest;

import org.gyreplan.gisdata.io.AtomicWrite;
import org.gyreplan.gisdata.netcdf.ClassicNetcdfWriter;
import org.gyreplan.gisdata.netcdf.DataType;

import java.io.IOException;
import java.nio.file.Path;

/**
 * Writes a synthetic, reproducible gridded 10 m wind file for the ingest benchmark, laid out like a reanalysis
 * download: netCDF 64-bit offset, {@code u10}/{@code v10} (time, latitude, longitude) packed as SHORT with
 * {@code scale_factor}/{@code add_offset}, latitude stored north → south, longitude 0 … 360, hours since 1900.
 * The field is invented (zonal trade-wind/westerly bands plus travelling waves), not real data.
 *
 * <pre>
 * usage: WindFileGenerator out.nc spacingDeg steps [stepHours]
 *   e.g. 1.0 1096 24   → 360 × 180 × 1096 daily steps (≈ 0.28 GB)
 *        0.25 1300 6   → 1440 × 720 × 1300 steps (≈ 5.4 GB)
 * </pre>
 */
public final class WindFileGenerator {
    private WindFileGenerator() {}

    /** Packing: 0.002 m s⁻¹ resolution, ±65 m s⁻¹ range. */
    static final double SCALE = 0.002;
    static final short FILL = -32767;

    public static void main(String[] args) throws IOException {
        if (args.length < 3) {
            System.err.println("usage: WindFileGenerator out.nc spacingDeg steps [stepHours]");
            System.exit(2);
        }
        Path out = Path.of(args[0]);
        double d = Double.parseDouble(args[1]);
        int nt = Integer.parseInt(args[2]);
        double stepHours = args.length > 3 ? Double.parseDouble(args[3]) : 24;
        long t0 = System.nanoTime();
        write(out, d, nt, stepHours);
        System.out.printf("wrote %s (%.2f GB) in %.1f s%n", out, java.nio.file.Files.size(out) / 1e9, (System.nanoTime() - t0) / 1e9);
    }

    static void write(Path out, double d, int nt, double stepHours) throws IOException {
        int nx = (int) Math.round(360 / d), ny = (int) Math.round(180 / d);
        double[] lon = new double[nx], lat = new double[ny];
        for (int i = 0; i < nx; i++) lon[i] = i * d + d / 2;
        for (int j = 0; j < ny; j++) lat[j] = 90 - d / 2 - j * d; // north → south
        ClassicNetcdfWriter w = new ClassicNetcdfWriter();
        w.globalText("Conventions", "CF-1.8").globalText("title", "synthetic 10 m wind for the Gyreplan ingest benchmark (invented)")
                .globalText("source", "org.gyreplan.bench.ingest.WindFileGenerator").globalText("history", "generated");
        w.recordDimension("time", nt).dimension("latitude", ny).dimension("longitude", nx);
        w.variable("time", DataType.DOUBLE, "time").text("standard_name", "time")
                .text("units", "hours since 1900-01-01 00:00:00.0").text("calendar", "gregorian");
        w.variable("latitude", DataType.FLOAT, "latitude").text("standard_name", "latitude").text("units", "degrees_north");
        w.variable("longitude", DataType.FLOAT, "longitude").text("standard_name", "longitude").text("units", "degrees_east");
        for (String n : new String[] {"u10", "v10"}) {
            w.variable(n, DataType.SHORT, "time", "latitude", "longitude")
                    .text("standard_name", n.equals("u10") ? "eastward_wind" : "northward_wind")
                    .text("units", "m s**-1")
                    .numbers("scale_factor", DataType.DOUBLE, SCALE).numbers("add_offset", DataType.DOUBLE, 0.0)
                    .sameType("_FillValue", FILL).sameType("missing_value", FILL);
        }
        // separable pattern: u = U(φ) + A(φ) cos(kλ − ωt), v = B(φ) sin(kλ − ωt)
        double[] uBase = new double[ny], amp = new double[ny], vAmp = new double[ny];
        for (int j = 0; j < ny; j++) {
            double phi = Math.toRadians(lat[j]);
            uBase[j] = -6 * Math.cos(3 * phi) * Math.cos(phi) + 2;            // trades and westerlies
            amp[j] = 4 * Math.pow(Math.sin(2 * phi), 2);
            vAmp[j] = 3 * Math.sin(2 * phi);
        }
        double[] ck = new double[nx], sk = new double[nx];
        for (int i = 0; i < nx; i++) {
            double a = 5 * Math.toRadians(lon[i]);
            ck[i] = Math.cos(a);
            sk[i] = Math.sin(a);
        }
        double t1900 = 24.0 * (java.time.LocalDate.of(2000, 1, 1).toEpochDay() - java.time.LocalDate.of(1900, 1, 1).toEpochDay());
        AtomicWrite.toFile(out, tmp -> {
            try (ClassicNetcdfWriter.Output o = w.open(tmp)) {
                double[] t = new double[nt];
                for (int k = 0; k < nt; k++) t[k] = t1900 + k * stepHours;
                o.write("time", t);
                o.write("latitude", lat);
                o.write("longitude", lon);
                double[] u = new double[nx * ny], v = new double[nx * ny];
                int[] st = {0, 0, 0}, ct = {1, ny, nx};
                for (int k = 0; k < nt; k++) {
                    double wt = 2 * Math.PI * k * stepHours / (24 * 7); // a wave period of 7 days
                    double cw = Math.cos(wt), sw = Math.sin(wt);
                    for (int j = 0; j < ny; j++) {
                        for (int i = 0; i < nx; i++) {
                            double c = ck[i] * cw + sk[i] * sw, s = sk[i] * cw - ck[i] * sw; // cos/sin(kλ − ωt)
                            u[j * nx + i] = Math.round((uBase[j] + amp[j] * c) / SCALE);
                            v[j * nx + i] = Math.round(vAmp[j] * s / SCALE);
                        }
                    }
                    st[0] = k;
                    o.write("u10", st, ct, u);
                    o.write("v10", st, ct, v);
                }
            }
        });
    }
}
