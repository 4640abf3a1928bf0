package org.gyreplan.gisdata.cf;

import org.gyreplan.gisdata.netcdf.NetcdfDataset;
import org.gyreplan.gisdata.netcdf.RealData;
import org.gyreplan.gisdata.netcdf.Variable;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Our CF-1.8 writer checked by real clients: the netCDF library's {@code ncdump} (header, values, times) and
 * GDAL's {@code gdalinfo} (georeference and CRS), and round-tripped through our reader. Values are stored as
 * FLOAT: tolerance 1e-6 relative (float has 24-bit mantissa, 6e-8, plus ncdump's 7 printed digits).
 */
class CfNetcdfWriterTest {
    @TempDir Path tmp;

    static final LonLatGrid GRID = new LonLatGrid(6, 4, 171, -33, 2, 2, 6.371e6, null); // 170°E … 182° = 178°W
    static final List<Instant> TIMES = List.of(Instant.parse("2021-01-01T00:00:00Z"), Instant.parse("2021-01-01T06:00:00Z"));

    static double value(int field, int k, int i, int j) {
        if (field == 1 && i == 2 && j == 1) return Double.NaN; // a land cell
        return (field == 0 ? 0.01 : -1e-6) * (1 + k + 0.1 * i + 0.37 * j);
    }

    private Path writeGridded() throws IOException {
        Path f = tmp.resolve("ekman.nc");
        List<CfNetcdfWriter.FieldSpec> specs = List.of(
                new CfNetcdfWriter.FieldSpec("tau_x", "Pa", "surface_downward_eastward_stress",
                        "eastward surface stress on the ocean, positive toward east"),
                new CfNetcdfWriter.FieldSpec("w_ek", "m s-1", null,
                        "Ekman pumping velocity, positive upward (upwelling)"));
        CfNetcdfWriter.writeGridded(f, GRID, TIMES, specs,
                new CfNetcdfWriter.GlobalInfo("test fields", "Gyreplan test", "created by a unit test", Map.of("comment", "invented values")),
                k -> {
                    double[][] v = new double[2][GRID.size()];
                    for (int fi = 0; fi < 2; fi++) {
                        for (int j = 0; j < GRID.ny(); j++) {
                            for (int i = 0; i < GRID.nx(); i++) v[fi][GRID.index(i, j)] = value(fi, k, i, j);
                        }
                    }
                    return List.of(v[0], v[1]);
                }, ProgressListener.NONE, CancelToken.none());
        return f;
    }

    @Test
    void griddedHeaderAsNcdumpSeesIt() throws IOException {
        Path f = writeGridded();
        String h = RealData.run("ncdump", "-h", f.toString());
        assertTrue(h.contains("time = UNLIMITED ; // (2 currently)"), h);
        assertTrue(h.contains("float tau_x(time, lat, lon)"), h);
        assertTrue(h.contains("tau_x:standard_name = \"surface_downward_eastward_stress\""), h);
        assertTrue(h.contains("tau_x:units = \"Pa\""), h);
        assertTrue(h.contains("tau_x:grid_mapping = \"crs\""), h);
        assertTrue(h.contains("tau_x:_FillValue = 9.96921e+36f"), h);
        assertTrue(h.contains("w_ek:long_name = \"Ekman pumping velocity, positive upward (upwelling)\""), h);
        assertFalse(h.contains("w_ek:standard_name"), "no invented standard names");
        assertTrue(h.contains("crs:grid_mapping_name = \"latitude_longitude\""), h);
        assertTrue(h.contains("crs:semi_major_axis = 6378137."), h);
        assertTrue(h.contains("crs:inverse_flattening = 298.257223563"), h);
        assertTrue(h.contains(":Conventions = \"CF-1.8\""), h);
        assertTrue(h.contains(":title = \"test fields\""), h);
        assertTrue(h.contains(":history = \"created by a unit test\""), h);
        assertTrue(h.contains(":source = \"Gyreplan test\""), h);
        assertTrue(h.contains("lon:units = \"degrees_east\"") && h.contains("lat:standard_name = \"latitude\""), h);
        // times as ncdump -t decodes them
        String t = RealData.run("ncdump", "-t", "-v", "time", f.toString());
        assertTrue(t.contains("\"2021-01-01\", \"2021-01-01 06\""), t);
        // values (ncdump prints '_' for the fill value)
        double[] v = RealData.ncdumpValues(f, "w_ek");
        assertEquals(2 * GRID.size(), v.length);
        for (int k = 0; k < 2; k++) {
            for (int j = 0; j < GRID.ny(); j++) {
                for (int i = 0; i < GRID.nx(); i++) {
                    double e = value(1, k, i, j), a = v[(k * GRID.ny() + j) * GRID.nx() + i];
                    if (Double.isNaN(e)) assertTrue(Double.isNaN(a));
                    else assertEquals(e, a, 1e-6 * Math.abs(e));
                }
            }
        }
    }

    @Test
    void griddedFileAsGdalSeesIt() throws IOException {
        Path f = writeGridded();
        String info = RealData.run("gdalinfo", "NETCDF:" + f + ":tau_x");
        assertTrue(info.contains("GEOGCRS[\"WGS 84\"") || info.contains("GEOGCS[\"WGS 84\""), info);
        assertTrue(info.contains("ID[\"EPSG\",4326]") || info.contains("AUTHORITY[\"EPSG\",\"4326\"]"), info);
        assertTrue(info.contains("Size is 6, 4"), info);
        // west edge 170, north edge -33 + 3·2 + 1 = -26; pixel 2 × −2 degrees
        assertTrue(info.contains("Origin = (170.000000000000000,-26.000000000000000)"), info);
        assertTrue(info.contains("Pixel Size = (2.000000000000000,-2.000000000000000)"), info);
        assertTrue(info.contains("NoData Value=9.96921e+36"), info);
        // values per band (one band per time step) at the centre of cell (i=3, j=1) = (177°E, 31°S)
        String[] v = RealData.run("gdallocationinfo", "-valonly", "-geoloc", "NETCDF:" + f + ":tau_x", "177", "-31")
                .trim().split("\\s+");
        assertEquals(2, v.length);
        assertEquals(value(0, 0, 3, 1), Double.parseDouble(v[0]), 1e-6 * value(0, 0, 3, 1));
        assertEquals(value(0, 1, 3, 1), Double.parseDouble(v[1]), 1e-6 * value(0, 1, 3, 1));
    }

    @Test
    void griddedRoundTripThroughOurReader() throws IOException {
        Path f = writeGridded();
        try (GriddedSeries s = GriddedSeries.openStress(f, VariableMapping.automatic()
                .with(VariableRole.NORTHWARD_STRESS, "tau_x"), null, null, null)) {
            assertTrue(s.grid().sameGeometry(GRID), s.grid().toString());
            assertEquals(TIMES, s.timeAxis().instants());
            var step = s.read(1);
            for (int j = 0; j < GRID.ny(); j++) {
                for (int i = 0; i < GRID.nx(); i++) {
                    assertEquals(value(0, 1, i, j), step.fields().get(0).at(i, j), 1e-6 * Math.abs(value(0, 1, i, j)));
                }
            }
        }
    }

    @Test
    void stationSeriesAsNcdumpAndOurReaderSeeThem() throws IOException {
        Path f = tmp.resolve("stations.nc");
        List<CfNetcdfWriter.Station> st = List.of(new CfNetcdfWriter.Station("Cape Aurora", -9.5, 38.25),
                new CfNetcdfWriter.Station("Port Lumen", 12.0, -4.5));
        double[][] idx = {{120.5, Double.NaN, -30}, {1, 2, 3}};
        CfNetcdfWriter.writeStations(f, st, List.of(Instant.parse("2020-06-01T00:00:00Z"), Instant.parse("2020-06-02T00:00:00Z"),
                        Instant.parse("2020-06-03T00:00:00Z")),
                List.of(new CfNetcdfWriter.FieldSpec("cui", "m3 s-1 (100 m)-1", null,
                        "coastal upwelling index: cross-shore Ekman transport per 100 m of coastline, positive offshore (upwelling)")),
                java.util.Collections.singletonList(idx), new CfNetcdfWriter.GlobalInfo("indices", "Gyreplan test", "unit test", null));
        String out = RealData.run("ncdump", f.toString());
        assertTrue(out.contains(":featureType = \"timeSeries\""), out);
        assertTrue(out.contains("station_name:cf_role = \"timeseries_id\""), out);
        assertTrue(out.contains("cui:coordinates = \"time lat lon station_name\""), out);
        assertTrue(out.contains("\"Cape Aurora\""), out);
        assertTrue(out.contains("\"Port Lumen\""), out);
        assertTrue(out.contains("cui =\n  120.5, _, -30,\n  1, 2, 3 ;"), out);
        assertTrue(out.contains("lon = -9.5, 12 ;"), out);
        try (NetcdfDataset nc = NetcdfDataset.open(f)) {
            Variable names = nc.variable("station_name");
            assertArrayEquals(new String[] {"Cape Aurora", "Port Lumen"}, names.readStrings());
            double[] v = nc.variable("cui").readAll();
            assertEquals(120.5, v[0], 0.0);
            assertEquals(CfNetcdfWriter.FILL, v[1], 0.0);
            assertEquals(3.0, v[5], 0.0);
            assertEquals(38.25, nc.variable("lat").readAll()[0], 0.0);
        }
        // the same file as netCDF-4 (nccopy): character arrays and fixed dimensions through the HDF5 reader
        Path nc4 = tmp.resolve("stations4.nc");
        RealData.run("nccopy", "-k", "nc4", f.toString(), nc4.toString());
        try (NetcdfDataset nc = NetcdfDataset.open(nc4)) {
            assertArrayEquals(new String[] {"Cape Aurora", "Port Lumen"}, nc.variable("station_name").readStrings());
            assertEquals(List.of("station", "time"), nc.variable("cui").dimensionNames());
            assertEquals(120.5, nc.variable("cui").readAll()[0], 0.0);
            assertEquals("timeSeries", nc.globalAttribute("featureType").text());
        }
    }
}
