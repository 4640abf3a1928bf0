package org.gyreplan.gisdata.cf;

import org.gyreplan.gisdata.io.AtomicWrite;
import org.gyreplan.gisdata.netcdf.ClassicNetcdfWriter;
import org.gyreplan.gisdata.netcdf.DataType;
import org.gyreplan.gisdata.netcdf.NetcdfDataset;
import org.gyreplan.gisdata.netcdf.RealData;
import org.gyreplan.gisdata.netcdf.Variable;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.*;

/**
 * CF packing and missing data (CF Conventions 1.8 §2.5.1 and §8.1): unpacked = packed × scale_factor + add_offset;
 * _FillValue, missing_value and values outside valid_range are missing. Hand-worked values; the stored raw
 * numbers are checked with {@code ncdump}. Tolerance 1e-12 (exact arithmetic up to rounding).
 */
class CfDecoderTest {
    @Test
    void packedShortWithFillMissingAndValidRange(@TempDir Path tmp) throws IOException {
        Path f = tmp.resolve("packed.nc");
        ClassicNetcdfWriter w = new ClassicNetcdfWriter();
        w.dimension("n", 6);
        w.variable("slp", DataType.SHORT, "n").text("units", "hPa")
                .numbers("scale_factor", DataType.FLOAT, 0.01f).numbers("add_offset", DataType.FLOAT, 1000f)
                .sameType("_FillValue", -32767).sameType("missing_value", -999).sameType("valid_range", -3000, 3000);
        double[] raw = {1325, -32767, -999, 3500, -3000, 0};
        AtomicWrite.toFile(f, p -> {
            try (var out = w.open(p)) {
                out.write("slp", raw);
            }
        });
        assertTrue(RealData.run("ncdump", "-v", "slp", f.toString()).contains("slp = 1325, _, -999, 3500, -3000, 0 ;"));
        try (NetcdfDataset nc = NetcdfDataset.open(f)) {
            Variable v = nc.variable("slp");
            assertArrayEquals(raw, v.readAll(), 0.0);
            CfDecoder d = new CfDecoder(v, 100); // hPa → Pa
            double[] x = v.readAll();
            d.decodeInPlace(x, 0, x.length);
            double s = 0.01f, o = 1000f; // the attributes are FLOAT
            assertEquals((1325 * s + o) * 100, x[0], 1e-9);   // 1013.25 hPa → 101325 Pa
            assertEquals(101325.0, x[0], 1e-3);
            assertTrue(Double.isNaN(x[1]), "_FillValue");
            assertTrue(Double.isNaN(x[2]), "missing_value");
            assertTrue(Double.isNaN(x[3]), "above valid_range");
            assertEquals((-3000 * s + o) * 100, x[4], 1e-9);  // the edge of valid_range is valid
            assertEquals(o * 100, x[5], 1e-9);
        }
    }

    @Test
    void defaultFillValueMarksUnwrittenFloats(@TempDir Path tmp) throws IOException {
        Path f = tmp.resolve("nofill.nc");
        ClassicNetcdfWriter w = new ClassicNetcdfWriter();
        w.dimension("n", 2);
        w.variable("u", DataType.FLOAT, "n").text("units", "m/s");
        AtomicWrite.toFile(f, p -> {
            try (var out = w.open(p)) {
                out.write("u", new double[] {3.5, 9.96921e36});
            }
        });
        // ncdump shows the netCDF default fill value of FLOAT as '_'
        assertTrue(RealData.run("ncdump", "-v", "u", f.toString()).contains("u = 3.5, _ ;"));
        try (NetcdfDataset nc = NetcdfDataset.open(f)) {
            double[] x = nc.variable("u").readAll();
            new CfDecoder(nc.variable("u"), 1).decodeInPlace(x, 0, 2);
            assertEquals(3.5, x[0], 0.0);
            assertTrue(Double.isNaN(x[1]));
        }
    }
}
