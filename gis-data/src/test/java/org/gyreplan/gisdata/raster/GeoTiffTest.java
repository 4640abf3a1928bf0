package org.gyreplan.gisdata.raster;

import org.gyreplan.gisdata.netcdf.NetcdfDataset;
import org.gyreplan.gisdata.netcdf.RealData;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.*;

/**
 * GeoTIFF writer checked by GDAL ({@code gdalinfo}, {@code gdallocationinfo}) and by our reader; our reader
 * checked on files GDAL writes ({@code gdal_translate} from the NOAA ETOPO60 netCDF: default uncompressed strips,
 * Int16, and DEFLATE tiles). Float32 storage: tolerance 1e-6 relative for values written from doubles.
 */
class GeoTiffTest {
    @TempDir Path tmp;

    private static ScalarField field() {
        LonLatGrid g = new LonLatGrid(5, 3, 170.25, -10.25, 0.5, 0.5, 6.371e6, null); // 170…172.5 E, −10.5…−9 N
        double[] v = new double[g.size()];
        for (int k = 0; k < v.length; k++) v[k] = 100 + k * 1.5;
        v[g.index(1, 2)] = Double.NaN;
        return new ScalarField(g, v, "depth", "m", "water depth, positive down");
    }

    @Test
    void gdalReadsOurGeoTiff() throws IOException {
        Path f = tmp.resolve("d.tif");
        GeoTiffWriter.write(f, field());
        String info = RealData.run("gdalinfo", "-stats", f.toString());
        assertTrue(info.contains("ID[\"EPSG\",4326]"), info);
        assertTrue(info.contains("GEOGCRS[\"WGS 84\""), info);
        assertTrue(info.contains("Size is 5, 3"), info);
        // west edge 170.25 − 0.25 = 170; north edge −10.25 + 2·0.5 + 0.25 = −9
        assertTrue(info.contains("Origin = (170.000000000000000,-9.000000000000000)"), info);
        assertTrue(info.contains("Pixel Size = (0.500000000000000,-0.500000000000000)"), info);
        assertTrue(info.contains("Type=Float32"), info);
        assertTrue(info.contains("NoData Value=-9999"), info);
        // 14 valid values 100 … 121 (one is nodata)
        assertTrue(info.contains("STATISTICS_MINIMUM=100"), info);
        assertTrue(info.contains("STATISTICS_MAXIMUM=121"), info);
        // value at the centre of cell (i=3, j=0): 170.25+1.5 = 171.75 E, −10.25 N → 100 + 3·1.5
        String v = RealData.run("gdallocationinfo", "-valonly", "-geoloc", f.toString(), "171.75", "-10.25").trim();
        assertEquals(104.5, Double.parseDouble(v), 1e-6);
        String nd = RealData.run("gdallocationinfo", "-valonly", "-geoloc", f.toString(), "170.75", "-9.25").trim();
        assertEquals(-9999, Double.parseDouble(nd), 0.0);
    }

    @Test
    void roundTripThroughOurReader() throws IOException {
        Path f = tmp.resolve("d.tif");
        ScalarField in = field();
        GeoTiffWriter.write(f, in);
        GeoTiffReader.Raster r = GeoTiffReader.read(f);
        assertEquals(4326, r.epsg());
        ScalarField out = r.toField("depth", "m", "");
        assertTrue(out.grid().sameGeometry(in.grid()), out.grid().toString());
        for (int k = 0; k < in.values().length; k++) {
            double e = in.values()[k];
            if (Double.isNaN(e)) assertTrue(Double.isNaN(out.values()[k]));
            else assertEquals(e, out.values()[k], 1e-6 * Math.abs(e));
        }
    }

    @Test
    void readsWhatGdalWritesFromEtopo60() throws IOException {
        Path nc = RealData.file("etopo60.cdf");
        double[] rose;
        try (NetcdfDataset d = NetcdfDataset.open(nc)) {
            rose = d.variable("ROSE").readAll(); // 180 rows south→north × 360 columns from 20.5°E
        }
        String src = "NETCDF:" + nc + ":ROSE";
        Path plain = tmp.resolve("plain.tif"), i16 = tmp.resolve("i16.tif"), tiled = tmp.resolve("tiled.tif");
        RealData.run("gdal_translate", "-q", src, plain.toString());
        RealData.run("gdal_translate", "-q", "-ot", "Int16", src, i16.toString());
        RealData.run("gdal_translate", "-q", "-co", "COMPRESS=DEFLATE", "-co", "TILED=YES", "-co", "BLOCKXSIZE=64",
                "-co", "BLOCKYSIZE=64", src, tiled.toString());
        for (Path p : new Path[] {plain, i16, tiled}) {
            GeoTiffReader.Raster r = GeoTiffReader.read(p);
            assertEquals(360, r.width());
            assertEquals(180, r.height());
            assertEquals(20.0, r.westDeg(), 1e-9, p.toString());
            assertEquals(90.0, r.northDeg(), 1e-9);
            ScalarField f = r.toField("z", "m", "");
            for (int k = 0; k < rose.length; k++) {
                // Float32 copies are exact; GDAL converts to Int16 by rounding (≤ 0.5 m)
                assertEquals(rose[k], f.values()[k], p == i16 ? 0.5 : 0.0, p.getFileName() + " value " + k);
            }
        }
        assertTrue(Files.size(tiled) < Files.size(plain));
    }

    @Test
    void badFilesAreClearErrors() throws IOException {
        Path txt = tmp.resolve("x.tif");
        Files.writeString(txt, "hello world");
        var e = assertThrows(IOException.class, () -> GeoTiffReader.read(txt));
        assertTrue(e.getMessage().contains(txt.toString()) && e.getMessage().contains("not a TIFF"), e.getMessage());
        Path good = tmp.resolve("g.tif");
        GeoTiffWriter.write(good, field());
        byte[] b = Files.readAllBytes(good);
        Path cut = tmp.resolve("cut.tif");
        Files.write(cut, java.util.Arrays.copyOf(b, b.length - 20));
        e = assertThrows(IOException.class, () -> GeoTiffReader.read(cut));
        assertTrue(e.getMessage().contains("truncated"), e.getMessage());
    }
}
