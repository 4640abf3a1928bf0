package org.gyreplan.gisdata.netcdf;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Our classic reader and our netCDF-4 reader against the netCDF library's own {@code ncdump} on NOAA open data
 * (Debian ferret-datasets: monthly_navy_winds.cdf, 144×73 2.5° grid, 132 months 1982–1992; coads_climatology.cdf,
 * 180×90 2° grid, 12 months). ncdump prints FLOAT values with 7 significant digits, so values agree within a
 * relative 1e-6 (5e-7 rounding plus margin).
 */
class ClassicReaderRealDataTest {
    static double[] navyU;     // ncdump -v UWND monthly_navy_winds.cdf (all 132 months)
    static double[] coadsSlp;  // ncdump -v SLP coads_climatology.cdf

    @BeforeAll
    static void dump() {
        navyU = RealData.ncdumpValues(RealData.file("monthly_navy_winds.cdf"), "UWND");
        coadsSlp = RealData.ncdumpValues(RealData.file("coads_climatology.cdf"), "SLP");
    }

    private static void assertSameAsNcdump(double[] expected, int from, double[] actual, double fill) {
        for (int k = 0; k < actual.length; k++) {
            double e = expected[from + k], a = actual[k];
            if (Double.isNaN(e)) {
                assertEquals(fill, a, "value " + (from + k) + " is a fill value in ncdump");
            } else {
                assertEquals(e, a, 1e-6 * Math.abs(e) + 1e-30, "value " + (from + k));
            }
        }
    }

    @Test
    void headerOfNavyWindsMatchesNcdumpH() throws IOException {
        try (NetcdfDataset nc = NetcdfDataset.open(RealData.file("monthly_navy_winds.cdf"))) {
            assertEquals(NetcdfFormat.CLASSIC, nc.format());
            // ncdump -h: FNOCX = 144, FNOCY = 73, TIME = UNLIMITED ; // (132 currently)
            assertEquals("[FNOCX = 144, FNOCY = 73, TIME = UNLIMITED (132)]", nc.dimensions().toString());
            Variable u = nc.variable("UWND");
            assertEquals(DataType.FLOAT, u.dataType());
            assertEquals("[TIME, FNOCY, FNOCX]", u.dimensionNames().toString());
            assertEquals("M/S", u.textAttribute("units"));
            assertEquals((double) -99.9f, u.attribute("_FillValue").number(0), 0.0);
            assertEquals("hour since 1980-01-14 14:00:00", nc.variable("TIME").textAttribute("units"));
            assertEquals("FERRET V4.45 (GUI) 22-May-97", nc.globalAttribute("history").text());
        }
    }

    @Test
    void oneMonthOfNavyWindIsReadWithoutLoadingTheFile() throws IOException {
        int nx = 144, ny = 73, month = 90; // July 1989
        try (NetcdfDataset nc = NetcdfDataset.open(RealData.file("monthly_navy_winds.cdf"))) {
            double[] step = nc.variable("UWND").read(new int[] {month, 0, 0}, new int[] {1, ny, nx});
            assertSameAsNcdump(navyU, month * ny * nx, step, (double) -99.9f);
            // one value at (TIME=90, FNOCY=40, FNOCX=100) via a 1×1×1 slab
            double one = nc.variable("UWND").read(new int[] {month, 40, 100}, new int[] {1, 1, 1})[0];
            assertEquals(navyU[(month * ny + 40) * nx + 100], one, 1e-6 * Math.abs(one));
            // a sub-block (rows 10..19, columns 50..69) of month 7
            double[] blk = nc.variable("UWND").read(new int[] {7, 10, 50}, new int[] {1, 10, 20});
            for (int j = 0; j < 10; j++) {
                for (int i = 0; i < 20; i++) {
                    double e = navyU[(7 * ny + 10 + j) * nx + 50 + i];
                    assertEquals(e, blk[j * 20 + i], 1e-6 * Math.abs(e));
                }
            }
            // mean over all finite values of the month, against the mean of ncdump's printed values
            double s = 0, se = 0;
            int n = 0, ne = 0;
            for (int k = 0; k < step.length; k++) {
                if (step[k] != (double) -99.9f) { s += step[k]; n++; }
                double e = navyU[month * ny * nx + k];
                if (!Double.isNaN(e)) { se += e; ne++; }
            }
            assertEquals(ne, n);
            assertEquals(se / ne, s / n, 1e-6);
        }
    }

    @Test
    void coadsSeaLevelPressureForAllMonthsMatchesNcdump() throws IOException {
        try (NetcdfDataset nc = NetcdfDataset.open(RealData.file("coads_climatology.cdf"))) {
            Variable slp = nc.variable("SLP");
            assertEquals(12 * 90 * 180, coadsSlp.length);
            double[] all = slp.readAll(); // record variable among 7: records interleave
            assertSameAsNcdump(coadsSlp, 0, all, (double) -1e34f);
            double[] march = slp.read(new int[] {2, 0, 0}, new int[] {1, 90, 180});
            assertSameAsNcdump(coadsSlp, 2 * 90 * 180, march, (double) -1e34f);
        }
    }

    @Test
    void netcdf4CopyByNccopyReadsIdentically(@TempDir Path tmp) throws IOException {
        Path src = RealData.file("monthly_navy_winds.cdf");
        Path nc4 = tmp.resolve("navy4.nc");
        // netCDF-4 with deflate level 5 and the shuffle filter, written by the netCDF library itself
        RealData.run("nccopy", "-k", "nc4", "-d", "5", "-s", src.toString(), nc4.toString());
        assertTrue(RealData.run("ncdump", "-hs", nc4.toString()).contains("_Shuffle = \"true\""));
        try (NetcdfDataset a = NetcdfDataset.open(src); NetcdfDataset b = NetcdfDataset.open(nc4)) {
            assertEquals(NetcdfFormat.NETCDF4, b.format());
            assertEquals(a.dimensions(), b.dimensions());
            Variable ua = a.variable("UWND"), ub = b.variable("UWND");
            assertEquals(ua.dimensionNames(), ub.dimensionNames());
            assertEquals(ua.dataType(), ub.dataType());
            assertEquals(ua.attribute("_FillValue"), ub.attribute("_FillValue"));
            assertEquals(ua.textAttribute("units"), ub.textAttribute("units"));
            for (int month : new int[] {0, 61, 131}) {
                int[] st = {month, 0, 0}, ct = {1, 73, 144};
                assertArrayEquals(ua.read(st, ct), ub.read(st, ct), 0.0, "month " + month);
            }
            assertArrayEquals(ua.read(new int[] {5, 20, 30}, new int[] {3, 7, 11}),
                    ub.read(new int[] {5, 20, 30}, new int[] {3, 7, 11}), 0.0);
            assertArrayEquals(a.variable("TIME").readAll(), b.variable("TIME").readAll(), 0.0);
            assertArrayEquals(a.variable("FNOCY").readAll(), b.variable("FNOCY").readAll(), 0.0);
        }
    }

    @Test
    void cdf2CopyByNccopyReadsIdentically(@TempDir Path tmp) throws IOException {
        Path src = RealData.file("coads_climatology.cdf");
        Path cdf2 = tmp.resolve("coads2.nc");
        RealData.run("nccopy", "-k", "64-bit offset", src.toString(), cdf2.toString());
        try (NetcdfDataset a = NetcdfDataset.open(src); NetcdfDataset b = NetcdfDataset.open(cdf2)) {
            assertEquals(NetcdfFormat.OFFSET_64, b.format());
            for (String v : new String[] {"UWND", "SLP", "COADSX", "TIME"}) {
                assertArrayEquals(a.variable(v).readAll(), b.variable(v).readAll(), 0.0, v);
            }
        }
    }

    @Test
    void coordinateAxesMatchNcdump() throws IOException {
        try (NetcdfDataset nc = NetcdfDataset.open(RealData.file("coads_climatology.cdf"))) {
            double[] x = nc.variable("COADSX").readAll();
            assertArrayEquals(RealData.ncdumpValues(nc.path(), "COADSX"), x, 0.0);
            assertEquals(21.0, x[0], 0.0);
            double[] t = nc.variable("TIME").readAll();
            assertEquals(366.0, t[0], 1e-9);
            assertEquals(1096.485, t[1], 1e-9);
        }
    }
}
