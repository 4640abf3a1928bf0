package org.gyreplan.gisdata.cf;

import org.gyreplan.gisdata.netcdf.RealData;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;

import static org.junit.jupiter.api.Assertions.*;

/** The inspector on NOAA open data; expected facts from {@code ncdump -h} / {@code ncdump -t} of the same files. */
class FileInspectorTest {
    @Test
    void navyWinds() throws IOException {
        FileInspector.FileSummary s = FileInspector.describe(RealData.file("monthly_navy_winds.cdf"));
        assertEquals("netCDF classic (CDF-1)", s.format());
        assertTrue(s.variables().stream().anyMatch(v -> v.name().equals("UWND") && v.interpretation().startsWith("eastward wind")));
        assertTrue(s.variables().stream().anyMatch(v -> v.name().equals("VWND") && v.interpretation().startsWith("northward wind")));
        assertTrue(s.variables().stream().anyMatch(v -> v.name().equals("FNOCX") && v.interpretation().equals("longitude axis")));
        FileInspector.GridInfo g = s.grid();
        assertEquals(144, g.nx());
        assertEquals(73, g.ny());
        assertEquals(2.5, g.dLonDeg(), 1e-12);
        assertTrue(g.global());
        assertEquals(18.75, g.westDeg(), 1e-9); // FNOCX starts at 20 (ncdump -v FNOCX)
        // ncdump -t -v TIME prints the last step as "1992-12-17 03:30"
        assertEquals(132, s.time().steps());
        assertEquals(Instant.parse("1992-12-17T03:30:00Z"), s.time().last());
        assertEquals("standard (default)", s.time().calendar());
        String text = s.toText();
        assertTrue(text.contains("UWND float[TIME, FNOCY, FNOCX]  units: M/S  long_name: ZONAL WIND"), text);
        assertTrue(text.contains("→ eastward wind (by common name; already m s-1)"), text);
        assertTrue(text.contains("grid: 144 × 73 cells"), text);
        assertTrue(text.contains("time: 132 steps"), text);
    }

    @Test
    void coadsPressureIsConvertedAndNetcdf4IsDescribed(@TempDir Path tmp) throws IOException {
        Path nc4 = tmp.resolve("c4.nc");
        RealData.run("nccopy", "-k", "nc4", "-d", "1", RealData.file("coads_climatology.cdf").toString(), nc4.toString());
        FileInspector.FileSummary s = FileInspector.describe(nc4);
        assertEquals("netCDF-4 (HDF5)", s.format());
        assertTrue(s.toText().contains("→ sea-level pressure (by common name; × 100.0 → Pa)"), s.toText());
        assertEquals(12, s.time().steps());
        assertEquals(180, s.grid().nx());
        assertTrue(s.variables().stream().anyMatch(v -> v.name().equals("SST") && v.interpretation().equals("not used by Gyreplan")));
    }

    @Test
    void etopoRelief() throws IOException {
        FileInspector.FileSummary s = FileInspector.describe(RealData.file("etopo60.cdf"));
        assertTrue(s.toText().contains("ROSE float[ETOPO60Y, ETOPO60X]"), s.toText());
        assertTrue(s.variables().stream().anyMatch(v -> v.name().equals("ROSE")
                && v.interpretation().startsWith("surface altitude (positive up)")), s.toText());
        assertNull(s.time());
    }

    @Test
    void geoTiff(@TempDir Path tmp) throws IOException {
        Path tif = tmp.resolve("e.tif");
        RealData.run("gdal_translate", "-q", "-a_srs", "EPSG:4326", "NETCDF:" + RealData.file("etopo60.cdf") + ":ROSE", tif.toString());
        FileInspector.FileSummary s = FileInspector.describe(tif);
        assertEquals("GeoTIFF", s.format());
        assertEquals(360, s.grid().nx());
        assertEquals(20.0, s.grid().westDeg(), 1e-9); // gdalinfo: Origin = (20, 90)
        assertTrue(s.grid().global());
        assertTrue(s.toText().contains("CRS EPSG:4326"), s.toText());
    }
}
