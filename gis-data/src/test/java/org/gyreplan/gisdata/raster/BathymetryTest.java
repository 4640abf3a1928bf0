package org.gyreplan.gisdata.raster;

import org.gyreplan.gisdata.cf.VariableMapping;
import org.gyreplan.gisdata.netcdf.RealData;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Water depth from NOAA ETOPO60 (1° relief, variable ROSE in metres, positive up; ETOPO60X = 20.5 … 379.5,
 * ETOPO60Y = −89.5 … 89.5), checked against values printed by {@code ncdump} with the regridding rule computed
 * here independently. Tolerance 1e-3 m (float values printed with 7 digits, depths up to ~6000 m).
 */
class BathymetryTest {
    static double[] rose; // ncdump -v ROSE etopo60.cdf

    @BeforeAll
    static void dump() {
        rose = RealData.ncdumpValues(RealData.file("etopo60.cdf"), "ROSE");
    }

    /** ROSE at the 1° cell whose centre is (lon, lat) = (k + 0.5, m + 0.5). */
    static double z(double lonCentre, double latCentre) {
        int col = (int) Math.round((((lonCentre - 20.5) % 360) + 360) % 360);
        int row = (int) Math.round(latCentre + 89.5);
        return rose[row * 360 + col];
    }

    @Test
    void areaAverageOnTwoDegreeGridAcrossGreenwich() throws IOException {
        // 2° cells from 10°W to 10°E, 30°N to 50°N: each holds four 1° source cells
        LonLatGrid target = LonLatGrid.covering(-10, 10, 30, 50, 2, 6.371e6);
        ScalarField d = Bathymetry.depthOnGrid(RealData.file("etopo60.cdf"), target, Bathymetry.Method.AREA_AVERAGE,
                VariableMapping.automatic(), Bathymetry.Sign.AUTO);
        assertEquals("m", d.units());
        int land = 0, sea = 0;
        for (int j = 0; j < target.ny(); j++) {
            for (int i = 0; i < target.nx(); i++) {
                double sum = 0;
                int water = 0;
                for (double dl : new double[] {-0.5, 0.5}) {
                    for (double dp : new double[] {-0.5, 0.5}) {
                        double zz = z(target.lonDeg(i) + dl, target.latDeg(j) + dp);
                        if (zz < 0) { water++; sum -= zz; }
                    }
                }
                double expected = water >= 2 ? sum / water : Double.NaN;
                double got = d.at(i, j);
                if (Double.isNaN(expected)) { assertTrue(Double.isNaN(got), "land at " + i + "," + j); land++; }
                else { assertEquals(expected, got, 1e-3, "depth at " + i + "," + j); sea++; }
            }
        }
        assertTrue(land > 10 && sea > 10, "the box holds both Iberia and the Atlantic: land " + land + ", sea " + sea);
    }

    @Test
    void bilinearAtSourceCorners() throws IOException {
        // target centres on whole degrees = corners of the 1° source cells: bilinear = mean of the 4 elevations
        LonLatGrid target = new LonLatGrid(11, 6, 140, -40, 1, 1, 6.371e6, null);
        ScalarField d = Bathymetry.depthOnGrid(RealData.file("etopo60.cdf"), target, Bathymetry.Method.BILINEAR,
                VariableMapping.automatic(), Bathymetry.Sign.AUTO);
        for (int j = 0; j < target.ny(); j++) {
            for (int i = 0; i < target.nx(); i++) {
                double lon = target.lonDeg(i), lat = target.latDeg(j);
                double mean = (z(lon - 0.5, lat - 0.5) + z(lon + 0.5, lat - 0.5) + z(lon - 0.5, lat + 0.5) + z(lon + 0.5, lat + 0.5)) / 4;
                double expected = mean < 0 ? -mean : Double.NaN;
                if (Double.isNaN(expected)) assertTrue(Double.isNaN(d.at(i, j)));
                else assertEquals(expected, d.at(i, j), 1e-3);
            }
        }
    }

    @Test
    void geoTiffFromGdalGivesTheSameDepths(@TempDir Path tmp) throws IOException {
        Path tif = tmp.resolve("etopo60.tif");
        RealData.run("gdal_translate", "-q", "NETCDF:" + RealData.file("etopo60.cdf") + ":ROSE", tif.toString());
        // a box across the antimeridian
        LonLatGrid target = LonLatGrid.covering(170, 200, -30, -10, 2, 6.371e6);
        ScalarField a = Bathymetry.depthOnGrid(RealData.file("etopo60.cdf"), target, Bathymetry.Method.AREA_AVERAGE,
                VariableMapping.automatic(), Bathymetry.Sign.AUTO);
        ScalarField b = Bathymetry.depthOnGrid(tif, target, Bathymetry.Method.AREA_AVERAGE,
                VariableMapping.automatic(), Bathymetry.Sign.AUTO);
        assertArrayEquals(a.values(), b.values(), 0.0);
        double[] r = a.range();
        assertTrue(r[0] > 0 && r[1] > 3000, "open Pacific depths: " + r[0] + "…" + r[1]);
    }
}
