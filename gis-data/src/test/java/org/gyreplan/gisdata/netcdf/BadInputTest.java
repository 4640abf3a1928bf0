package org.gyreplan.gisdata.netcdf;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;

import static org.junit.jupiter.api.Assertions.*;

/** Bad input gives a clear error naming the file and what was expected. */
class BadInputTest {
    @TempDir Path tmp;

    private Path truncatedCopy(String name, int bytes) throws IOException {
        byte[] all = Files.readAllBytes(RealData.file(name));
        Path p = tmp.resolve("cut-" + bytes + "-" + name);
        Files.write(p, Arrays.copyOf(all, bytes));
        return p;
    }

    @Test
    void truncatedInsideTheData() throws IOException {
        Path p = truncatedCopy("monthly_navy_winds.cdf", 100_000);
        var e = assertThrows(NetcdfFormatException.class, () -> NetcdfDataset.open(p));
        assertTrue(e.getMessage().contains(p.toString()), e.getMessage());
        assertTrue(e.getMessage().contains("truncated"), e.getMessage());
        assertTrue(e.getMessage().contains("100000"), "says how long the file is: " + e.getMessage());
    }

    @Test
    void truncatedInsideTheHeader() throws IOException {
        Path p = truncatedCopy("monthly_navy_winds.cdf", 200);
        var e = assertThrows(NetcdfFormatException.class, () -> NetcdfDataset.open(p));
        assertTrue(e.getMessage().contains(p.toString()) && e.getMessage().contains("header"), e.getMessage());
    }

    @Test
    void truncatedNetcdf4() throws IOException {
        Path nc4 = tmp.resolve("n4.nc");
        RealData.run("nccopy", "-k", "nc4", "-d", "1", RealData.file("etopo60.cdf").toString(), nc4.toString());
        byte[] all = Files.readAllBytes(nc4);
        Path p = tmp.resolve("cut4.nc");
        Files.write(p, Arrays.copyOf(all, all.length / 3));
        var e = assertThrows(IOException.class, () -> {
            try (NetcdfDataset nc = NetcdfDataset.open(p)) {
                nc.variable("ROSE").readAll();
            }
        });
        assertTrue(e.getMessage().contains(p.toString()), e.getMessage());
    }

    @Test
    void notNetcdf() throws IOException {
        Path p = tmp.resolve("notes.txt");
        Files.writeString(p, "lon,lat,u\n1,2,3\n");
        var e = assertThrows(NetcdfFormatException.class, () -> NetcdfDataset.open(p));
        assertTrue(e.getMessage().contains(p.toString()), e.getMessage());
        assertTrue(e.getMessage().contains("not a netCDF file") && e.getMessage().contains("CDF\\001"), e.getMessage());
        Path empty = tmp.resolve("empty.nc");
        Files.write(empty, new byte[0]);
        e = assertThrows(NetcdfFormatException.class, () -> NetcdfDataset.open(empty));
        assertTrue(e.getMessage().contains("empty"), e.getMessage());
    }

    @Test
    void missingVariableListsTheFileContents() throws IOException {
        try (NetcdfDataset nc = NetcdfDataset.open(RealData.file("etopo60.cdf"))) {
            var e = assertThrows(NetcdfFormatException.class, () -> nc.variable("depth"));
            assertTrue(e.getMessage().contains("'depth'") && e.getMessage().contains("ROSE")
                    && e.getMessage().contains("ETOPO60X"), e.getMessage());
        }
    }
}
