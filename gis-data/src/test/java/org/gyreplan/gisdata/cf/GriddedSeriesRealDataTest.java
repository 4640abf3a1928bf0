package org.gyreplan.gisdata.cf;

import org.gyreplan.gisdata.io.AtomicWrite;
import org.gyreplan.gisdata.netcdf.ClassicNetcdfWriter;
import org.gyreplan.gisdata.netcdf.DataType;
import org.gyreplan.gisdata.netcdf.NetcdfDataset;
import org.gyreplan.gisdata.netcdf.NetcdfFormatException;
import org.gyreplan.gisdata.netcdf.RealData;
import org.gyreplan.gisdata.units.UnitConversions;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Gridded series on NOAA open data, checked value by value against {@code ncdump}. The navy winds grid has
 * FNOCX = 20, 22.5, …, 377.5 and FNOCY = −90 … 90 (ascending); COADS has COADSX = 21, 23, …, 379 and
 * COADSY = −89 … 89. Index arithmetic for the expected values is written out here independently of the code
 * under test. ncdump prints 7 significant digits: relative tolerance 1e-6.
 */
class GriddedSeriesRealDataTest {
    static double[] navyU, navyV, coadsU, coadsSlp;

    @BeforeAll
    static void dump() {
        Path navy = RealData.file("monthly_navy_winds.cdf");
        navyU = RealData.ncdumpValues(navy, "UWND");
        navyV = RealData.ncdumpValues(navy, "VWND");
        Path coads = RealData.file("coads_climatology.cdf");
        coadsU = RealData.ncdumpValues(coads, "UWND");
        coadsSlp = RealData.ncdumpValues(coads, "SLP");
    }

    private static void near(double expected, double actual, String what) {
        if (Double.isNaN(expected)) assertTrue(Double.isNaN(actual), what + ": expected missing, got " + actual);
        else assertEquals(expected, actual, 1e-6 * Math.abs(expected) + 1e-12, what);
    }

    @Test
    void navyWindBoxAcrossGreenwichWithTimeWindow() throws IOException {
        BoundingBox box = new BoundingBox(-30, 30, -20, 20);
        try (GriddedSeries s = GriddedSeries.openWind(RealData.file("monthly_navy_winds.cdf"),
                VariableMapping.automatic(), box, Instant.parse("1989-01-01T00:00:00Z"), Instant.parse("1989-12-31T23:59:59Z"))) {
            assertEquals(12, s.size(), "12 months of 1989");
            LonLatGrid g = s.grid();
            // cells overlapping [-30, 30]: centres -30 … 30 (25 columns), latitudes -20 … 20 (17 rows)
            assertEquals(25, g.nx());
            assertEquals(17, g.ny());
            assertEquals(-30.0, g.lon0Deg(), 1e-9);
            assertEquals(-20.0, g.lat0Deg(), 1e-9);
            assertEquals(2.5, g.dLonDeg(), 1e-12);
            // ncdump -t: TIME[84] = 1989-01-16 ..., the first month of 1989 is file step 84
            int fileStep = 84;
            assertEquals(1989, s.time(0).atZone(java.time.ZoneOffset.UTC).getYear());
            assertEquals(1, s.time(0).atZone(java.time.ZoneOffset.UTC).getMonthValue());
            GriddedSeries.Step july = s.read(6);
            ScalarField u = july.field(VariableRole.EASTWARD_WIND);
            assertEquals("eastward_wind", u.name());
            assertEquals("m s-1", u.units());
            for (int j = 0; j < g.ny(); j++) {
                for (int i = 0; i < g.nx(); i++) {
                    double lon = g.lonDeg(i), lat = g.latDeg(j);
                    int col = (int) Math.round((((lon - 20) % 360) + 360) % 360 / 2.5);
                    int row = (int) Math.round((lat + 90) / 2.5);
                    int k = ((fileStep + 6) * 73 + row) * 144 + col;
                    near(navyU[k], u.at(i, j), "u at " + lon + "," + lat);
                    near(navyV[k], july.vector().northward().at(i, j), "v at " + lon + "," + lat);
                }
            }
        }
    }

    @Test
    void wholeGridMeanOfOneMonthMatchesNcdump() throws IOException {
        // whole file grid (poles dropped: their cells would extend beyond ±90°), March 1985 = step 38
        try (GriddedSeries s = GriddedSeries.openWind(RealData.file("monthly_navy_winds.cdf"),
                VariableMapping.automatic(), null, null, null)) {
            assertEquals(132, s.size());
            assertEquals(144, s.grid().nx());
            assertEquals(71, s.grid().ny());
            ScalarField u = s.read(38).field(VariableRole.EASTWARD_WIND);
            double sum = 0, sumE = 0;
            int n = 0, nE = 0;
            for (int j = 0; j < 71; j++) {
                for (int i = 0; i < 144; i++) {
                    double a = u.at(i, j);
                    if (!Double.isNaN(a)) { sum += a; n++; }
                    double e = navyU[(38 * 73 + j + 1) * 144 + i];
                    if (!Double.isNaN(e)) { sumE += e; nE++; }
                }
            }
            assertEquals(nE, n, "same count of valid values");
            assertEquals(sumE / nE, sum / n, 1e-6, "plain mean of the month (m/s)");
        }
    }

    @Test
    void coadsBoxAcrossTheAxisSeamAndTheAntimeridian() throws IOException {
        Path f = RealData.file("coads_climatology.cdf");
        // COADSX starts at 21: a box from -10 to 10 wraps around the file's seam (379 → 21)
        try (GriddedSeries s = GriddedSeries.open(f, List.of(VariableRole.EASTWARD_WIND, VariableRole.SEA_LEVEL_PRESSURE),
                VariableMapping.automatic(), new BoundingBox(-10, 10, 30, 50), null, null)) {
            LonLatGrid g = s.grid();
            assertEquals(-9.0, g.lon0Deg(), 1e-9);
            assertEquals(10, g.nx());
            assertEquals(31.0, g.lat0Deg(), 1e-9);
            check(s, 4);
        }
        // across the antimeridian: 170°E … 160°W
        try (GriddedSeries s = GriddedSeries.open(f, List.of(VariableRole.EASTWARD_WIND, VariableRole.SEA_LEVEL_PRESSURE),
                VariableMapping.automatic(), new BoundingBox(170, -160, -40, -10), null, null)) {
            assertEquals(171.0, s.grid().lon0Deg(), 1e-9);
            assertEquals(15, s.grid().nx());
            check(s, 0);
        }
    }

    private static void check(GriddedSeries s, int month) throws IOException {
        LonLatGrid g = s.grid();
        GriddedSeries.Step st = s.read(month);
        for (int j = 0; j < g.ny(); j++) {
            for (int i = 0; i < g.nx(); i++) {
                int col = (int) Math.round((((g.lonDeg(i) - 21) % 360) + 360) % 360 / 2);
                int row = (int) Math.round((g.latDeg(j) + 89) / 2);
                int k = (month * 90 + row) * 180 + col;
                near(coadsU[k], st.fields().get(0).at(i, j), "u");
                // SLP is in "MB" in the file: ×100 to Pa
                near(coadsSlp[k] * 100, st.fields().get(1).at(i, j), "slp");
            }
        }
    }

    @Test
    void netcdf4CopyGivesTheSameSeries(@TempDir Path tmp) throws IOException {
        Path classic = RealData.file("coads_climatology.cdf");
        Path nc4 = tmp.resolve("coads4.nc");
        RealData.run("nccopy", "-k", "nc4", "-d", "5", "-s", classic.toString(), nc4.toString());
        BoundingBox box = new BoundingBox(-30, 20, -50, 10);
        List<VariableRole> roles = List.of(VariableRole.EASTWARD_WIND, VariableRole.NORTHWARD_WIND, VariableRole.SEA_LEVEL_PRESSURE);
        try (GriddedSeries a = GriddedSeries.open(classic, roles, VariableMapping.automatic(), box, null, null);
             GriddedSeries b = GriddedSeries.open(nc4, roles, VariableMapping.automatic(), box, null, null)) {
            assertTrue(a.grid().sameGeometry(b.grid()));
            assertEquals(a.timeAxis(), b.timeAxis());
            for (int k : new int[] {0, 7, 11}) {
                for (int r = 0; r < 3; r++) {
                    assertArrayEquals(a.read(k).fields().get(r).values(), b.read(k).fields().get(r).values(), 0.0);
                }
            }
        }
    }

    @Test
    void descendingLatitudeAndKnotsAreNormalised(@TempDir Path tmp) throws IOException {
        // a copy of one COADS month with latitude north→south, longitudes −179…179, wind in knots
        Path f = tmp.resolve("desc.nc");
        int nx = 180, ny = 90;
        double[] lon = new double[nx], lat = new double[ny], u = new double[nx * ny];
        for (int i = 0; i < nx; i++) lon[i] = -179 + 2 * i;
        for (int j = 0; j < ny; j++) lat[j] = 89 - 2 * j;
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                int col = Math.floorMod((int) Math.round((lon[i] - 21) / 2), 180);
                int row = (int) Math.round((lat[j] + 89) / 2);
                double e = coadsU[(5 * 90 + row) * 180 + col];
                u[j * nx + i] = Double.isNaN(e) ? Double.NaN : e / (1852.0 / 3600.0);
            }
        }
        ClassicNetcdfWriter w = new ClassicNetcdfWriter();
        w.dimension("latitude", ny).dimension("longitude", nx);
        w.variable("latitude", DataType.DOUBLE, "latitude").text("standard_name", "latitude").text("units", "degrees_north");
        w.variable("longitude", DataType.DOUBLE, "longitude").text("standard_name", "longitude").text("units", "degrees_east");
        w.variable("wind_e", DataType.FLOAT, "latitude", "longitude").text("standard_name", "eastward_wind")
                .text("units", "knots").sameType("_FillValue", -999);
        AtomicWrite.toFile(f, p -> {
            try (var out = w.open(p)) {
                out.write("latitude", lat);
                out.write("longitude", lon);
                out.write("wind_e", u);
            }
        });
        try (GriddedSeries s = GriddedSeries.open(f, List.of(VariableRole.EASTWARD_WIND), VariableMapping.automatic(),
                new BoundingBox(100, 120, -10, 10), null, null)) {
            assertEquals(1, s.size());
            assertNull(s.time(0));
            LonLatGrid g = s.grid();
            assertEquals(-9.0, g.lat0Deg(), 1e-9, "latitude ascending after the flip");
            assertEquals(101.0, g.lon0Deg(), 1e-9);
            ScalarField got = s.read(0).fields().get(0);
            for (int j = 0; j < g.ny(); j++) {
                for (int i = 0; i < g.nx(); i++) {
                    int col = (int) Math.round((g.lonDeg(i) - 21) / 2);
                    int row = (int) Math.round((g.latDeg(j) + 89) / 2);
                    double e = coadsU[(5 * 90 + row) * 180 + col];
                    // written as float knots, read back × 1852/3600: float rounding 1e-6 relative
                    near(e, got.at(i, j), "u at " + g.lonDeg(i) + "," + g.latDeg(j));
                }
            }
        }
    }

    @Test
    void regionalGridInZeroTo360WithLongitudeFirstAndABoxInMinus180To180(@TempDir Path tmp) throws IOException {
        // invented regional file: lon 150.5 … 249.5 (0–360 convention), lat 10.5 … 39.5, dimension order (lon, lat),
        // pressure in hPa = 1000 + lon/10 + lat/100 so every value tells its own position
        Path f = tmp.resolve("regional.nc");
        int nx = 100, ny = 30;
        double[] lon = new double[nx], lat = new double[ny], p = new double[nx * ny];
        for (int i = 0; i < nx; i++) lon[i] = 150.5 + i;
        for (int j = 0; j < ny; j++) lat[j] = 10.5 + j;
        for (int i = 0; i < nx; i++) for (int j = 0; j < ny; j++) p[i * ny + j] = 1000 + lon[i] / 10 + lat[j] / 100;
        ClassicNetcdfWriter w = new ClassicNetcdfWriter();
        w.dimension("x", nx).dimension("y", ny);
        w.variable("x", DataType.DOUBLE, "x").text("units", "degrees_east");
        w.variable("y", DataType.DOUBLE, "y").text("units", "degrees_north");
        w.variable("msl", DataType.DOUBLE, "x", "y").text("units", "hPa");
        AtomicWrite.toFile(f, q -> {
            try (var out = w.open(q)) {
                out.write("x", lon);
                out.write("y", lat);
                out.write("msl", p);
            }
        });
        // box 170°W … 120°W = 190 … 240 in the file's convention
        try (GriddedSeries s = GriddedSeries.open(f, List.of(VariableRole.SEA_LEVEL_PRESSURE), VariableMapping.automatic(),
                new BoundingBox(-170, -120, 20, 30), null, null)) {
            LonLatGrid g = s.grid();
            assertEquals(-169.5, g.lon0Deg(), 1e-9);
            assertEquals(50, g.nx());
            assertEquals(20.5, g.lat0Deg(), 1e-9);
            assertEquals(10, g.ny());
            ScalarField got = s.read(0).fields().get(0);
            for (int j = 0; j < g.ny(); j++) {
                for (int i = 0; i < g.nx(); i++) {
                    double expectedHpa = 1000 + (g.lonDeg(i) + 360) / 10 + g.latDeg(j) / 100;
                    assertEquals(expectedHpa * 100, got.at(i, j), 1e-7, "Pa at " + g.lonDeg(i) + "," + g.latDeg(j));
                }
            }
        }
    }

    @Test
    void missingVariableListsWhatTheFileHas() throws IOException {
        var e = assertThrows(NetcdfFormatException.class, () -> GriddedSeries.openStress(
                RealData.file("coads_climatology.cdf"), VariableMapping.automatic(), null, null, null));
        String m = e.getMessage();
        assertTrue(m.contains("coads_climatology.cdf"), m);
        assertTrue(m.contains("surface_downward_eastward_stress"), "says what was expected: " + m);
        assertTrue(m.contains("UWND[TIME, COADSY, COADSX] units='M/S'"), "lists the file's variables: " + m);
        assertTrue(m.contains("SLP"), m);
        // an explicit mapping to a name the file lacks
        e = assertThrows(NetcdfFormatException.class, () -> GriddedSeries.openWind(RealData.file("coads_climatology.cdf"),
                VariableMapping.automatic().with(VariableRole.EASTWARD_WIND, "U10"), null, null, null));
        assertTrue(e.getMessage().contains("'U10'") && e.getMessage().contains("AIRT"), e.getMessage());
    }

    @Test
    void explicitMappingWins() throws IOException {
        // map "eastward wind" to WSPD just to show the mapping is obeyed (WSPD has units M/S)
        try (GriddedSeries s = GriddedSeries.openWind(RealData.file("coads_climatology.cdf"),
                VariableMapping.automatic().with(VariableRole.EASTWARD_WIND, "WSPD"), null, null, null)) {
            assertEquals("WSPD", s.variables().get(0).name());
            assertEquals("VWND", s.variables().get(1).name());
        }
    }

    @Test
    void unknownUnitsAreAnErrorNamingFileAndVariable(@TempDir Path tmp) throws IOException {
        Path f = tmp.resolve("odd.nc");
        ClassicNetcdfWriter w = new ClassicNetcdfWriter();
        w.dimension("lat", 2).dimension("lon", 3);
        w.variable("lat", DataType.FLOAT, "lat").text("units", "degrees_north");
        w.variable("lon", DataType.FLOAT, "lon").text("units", "degrees_east");
        w.variable("u10", DataType.FLOAT, "lat", "lon").text("standard_name", "eastward_wind").text("units", "furlongs/fortnight");
        AtomicWrite.toFile(f, p -> {
            try (var out = w.open(p)) {
                out.write("lat", new double[] {0, 1});
                out.write("lon", new double[] {0, 1, 2});
                out.write("u10", new double[6]);
            }
        });
        var e = assertThrows(UnitConversions.UnknownUnitsException.class, () -> GriddedSeries.open(f,
                List.of(VariableRole.EASTWARD_WIND), VariableMapping.automatic(), null, null, null));
        assertTrue(e.getMessage().contains("furlongs/fortnight") && e.getMessage().contains("'u10'")
                && e.getMessage().contains("odd.nc"), e.getMessage());
        try (NetcdfDataset nc = NetcdfDataset.open(f)) {
            assertEquals(2, nc.variables().get(2).rank());
        }
    }
}
