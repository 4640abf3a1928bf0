package org.gyreplan.gisdata.csv;

import org.gyreplan.gisdata.vector.Ogr;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

/** CSV writing after RFC 4180, read back by GDAL's CSV driver (an independent reader) and by our record splitter. */
class CsvTableTest {
    @TempDir Path dir;

    @Test
    void writesRfc4180WithUnitsInTheHeaderAndGdalReadsIt() throws Exception {
        CsvTable t = new CsvTable(List.of(CsvTable.column("time", null), CsvTable.column("site", null),
                CsvTable.column("index", "m3 s-1 per 100 m"), "index_m3_s_per_100m"));
        t.add(Instant.parse("2026-01-01T00:00:00Z"), "Cape \"North\", inner", 12.5, 0.1);
        t.add(Instant.parse("2026-01-02T00:00:00Z"), "Bay\nSouth", Double.NaN, -3.0);
        Path f = dir.resolve("index.csv");
        t.write(f);
        byte[] bytes = Files.readAllBytes(f);
        assertNotEquals((byte) 0xEF, bytes[0], "no byte-order mark");
        String text = new String(bytes, StandardCharsets.UTF_8);
        // RFC 4180 §2: CRLF line ends, quotes doubled inside a quoted field, line breaks inside quotes
        assertEquals("time,site,index [m3 s-1 per 100 m],index_m3_s_per_100m\r\n"
                + "2026-01-01T00:00:00Z,\"Cape \"\"North\"\", inner\",12.5,0.1\r\n"
                + "2026-01-02T00:00:00Z,\"Bay\nSouth\",,-3\r\n", text);

        List<CsvRecords.Line> back = CsvRecords.parse(text, ',');
        assertEquals(3, back.size());
        assertEquals("Cape \"North\", inner", back.get(1).fields().get(1));
        assertEquals("Bay\nSouth", back.get(2).fields().get(1));
        assertEquals(3, back.get(2).lineNumber());

        Ogr.Run r = Ogr.run("ogrinfo", "-ro", "-al", f.toString());
        assertEquals(0, r.exit(), r.err());
        assertTrue(r.out().contains("Feature Count: 2"), r.out());
        assertTrue(r.out().contains("site (String) = Cape \"North\", inner"), r.out());
        assertTrue(r.out().contains("index [m3 s-1 per 100 m] (String) = 12.5"), r.out());
    }

    @Test
    void refusesRowsOfTheWrongLength() {
        CsvTable t = new CsvTable(List.of("a", "b"));
        assertThrows(IllegalArgumentException.class, () -> t.add(1.0));
    }
}
