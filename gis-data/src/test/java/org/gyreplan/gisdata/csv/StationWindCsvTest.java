package org.gyreplan.gisdata.csv;

import org.gyreplan.gisdata.csv.CsvFormatException.Problem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneOffset;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Station wind CSV. Expected vectors follow the meteorological convention (direction the wind comes from, clockwise
 * from true north; WMO common practice): u = −s sin θ, v = −s cos θ. Knot = 1852/3600 m/s exactly (BIPM SI Brochure
 * 2019, Table 8). Tolerances: 1e-12 m/s (floating-point arithmetic).
 */
class StationWindCsvTest {
    @TempDir Path dir;
    static final double KN = 1852.0 / 3600.0;
    static final double TOL = 1e-12;

    Path write(String name, String text) throws Exception {
        Path f = dir.resolve(name);
        Files.writeString(f, text);
        return f;
    }

    @Test
    void speedInKnotsAndDirectionFrom() throws Exception {
        Path f = write("station.csv", "# invented station, Cape Fictional\n"
                + "time,speed [kn],direction [deg]\n"
                + "2026-01-05T00:00:00Z,10,0\n"        // north wind → blows southward
                + "2026-01-05T06:00:00Z,10,90\n"       // east wind → blows westward
                + "2026-01-05T12:00:00Z,10,225\n"      // south-west wind → blows north-east
                + "2026-01-05T18:00:00Z,,\n"           // gap
                + "2026-01-06 00:00,NaN,180\n"         // gap, local time form
                + "2026-01-06T06:00,0,\n");            // calm
        StationWindSeries s = StationWindCsv.read(f);
        assertEquals(6, s.size());
        assertEquals(4, s.validCount());
        assertEquals(0.0, s.eastwardMs(0), TOL);
        assertEquals(-10 * KN, s.northwardMs(0), TOL);
        assertEquals(-10 * KN, s.eastwardMs(1), TOL);
        assertEquals(0.0, s.northwardMs(1), TOL);
        assertEquals(10 * KN / Math.sqrt(2), s.eastwardMs(2), TOL);
        assertEquals(10 * KN / Math.sqrt(2), s.northwardMs(2), TOL);
        assertTrue(Double.isNaN(s.eastwardMs(3)) && Double.isNaN(s.northwardMs(3)));
        assertTrue(Double.isNaN(s.eastwardMs(4)));
        assertEquals(Instant.parse("2026-01-06T00:00:00Z"), s.time(4));
        assertEquals(0.0, s.eastwardMs(5), 0);
        assertEquals(0.0, s.northwardMs(5), 0);
        assertEquals(-10 * KN, s.northwardSeries().value(0), TOL);
        assertEquals(s.time(2), s.eastwardSeries().time(2));
    }

    @Test
    void componentsInKmPerHourWithDateAndTimeColumnsAndOffsets() throws Exception {
        Path f = write("uv.csv", "date;time;u (km/h);v (km/h)\n2026-07-01;6:00;36;-18\n2026-07-01;18:30;;7.2\n");
        StationWindSeries s = StationWindCsv.read(f, StationWindCsv.Options.DEFAULT.withZone(ZoneOffset.ofHours(2)));
        assertEquals(Instant.parse("2026-07-01T04:00:00Z"), s.time(0));
        assertEquals(10.0, s.eastwardMs(0), TOL);
        assertEquals(-5.0, s.northwardMs(0), TOL);
        assertTrue(Double.isNaN(s.northwardMs(1)), "a gap in u makes the whole vector a gap");

        Path g = write("off.csv", "timestamp,u,v\n2026-07-01T06:00+02:00,1,2\n2026-07-01T07:00:00-0100,3,4\n");
        StationWindSeries t = StationWindCsv.read(g, StationWindCsv.Options.DEFAULT.withSpeedUnit(SpeedUnit.METRE_PER_SECOND));
        assertEquals(Instant.parse("2026-07-01T04:00:00Z"), t.time(0));
        assertEquals(Instant.parse("2026-07-01T08:00:00Z"), t.time(1));
        assertEquals(3.0, t.eastwardMs(1), 0);
    }

    @Test
    void dailySeriesFromASpreadsheetExportWithByteOrderMark() throws Exception {
        Path f = write("daily.csv", "\uFEFFdate;wind_speed (knots);wind_direction (deg);station\r\n"
                + "2026-02-01;20;270;\"Cape; North\"\r\n2026-02-02;20;360;\"Cape; North\"\r\n");
        StationWindSeries s = StationWindCsv.read(f);
        assertEquals(Instant.parse("2026-02-02T00:00:00Z"), s.time(1));
        assertEquals(20 * KN, s.eastwardMs(0), TOL);   // west wind blows eastward
        assertEquals(-20 * KN, s.northwardMs(1), TOL); // 360° = north wind
        assertEquals(0.0, s.eastwardMs(1), TOL);
    }

    @Test
    void badRowNamesFileLineAndColumn() throws Exception {
        Path f = write("bad.csv", "# comment\ntime,speed [m/s],direction\n2026-01-01T00:00Z,5,10\n2026-01-01T01:00Z,5.5.1,10\n");
        CsvFormatException e = assertThrows(CsvFormatException.class, () -> StationWindCsv.read(f));
        assertEquals(Problem.BAD_VALUE, e.problem());
        assertEquals(4, e.line());
        assertEquals("speed [m/s]", e.column());
        assertTrue(e.getMessage().startsWith("bad.csv, line 4, column \"speed [m/s]\": \"5.5.1\" is not a number"), e.getMessage());

        CsvFormatException dir = assertThrows(CsvFormatException.class, () -> StationWindCsv.read(write("dir.csv",
                "time,speed [m/s],direction\n2026-01-01T00:00Z,5,400\n")));
        assertEquals(Problem.BAD_VALUE, dir.problem());
        assertEquals(2, dir.line());

        CsvFormatException time = assertThrows(CsvFormatException.class, () -> StationWindCsv.read(write("time.csv",
                "time,speed [m/s],direction\n2026-01-01T00:00Z,5,40\n2026-01-01T00:00Z,5,40\n")));
        assertEquals(Problem.TIME_NOT_INCREASING, time.problem());
        assertEquals(3, time.line());

        CsvFormatException when = assertThrows(CsvFormatException.class, () -> StationWindCsv.read(write("when.csv",
                "time,speed [m/s],direction\n01/02/2026 00:00,5,40\n")));
        assertEquals(Problem.BAD_VALUE, when.problem());
        assertEquals("time", when.column());
    }

    @Test
    void unknownOrMissingSpeedUnitIsRefused() throws Exception {
        CsvFormatException e = assertThrows(CsvFormatException.class, () -> StationWindCsv.read(write("u.csv",
                "time,speed [furlong/fortnight],direction\n2026-01-01T00:00Z,5,10\n")));
        assertEquals(Problem.UNKNOWN_UNIT, e.problem());
        assertTrue(e.getMessage().contains("furlong/fortnight") && e.getMessage().contains("kn"), e.getMessage());

        Path noUnit = write("n.csv", "time,speed,direction\n2026-01-01T00:00Z,5,270\n");
        assertEquals(Problem.UNKNOWN_UNIT, assertThrows(CsvFormatException.class, () -> StationWindCsv.read(noUnit)).problem());
        StationWindSeries s = StationWindCsv.read(noUnit, StationWindCsv.Options.DEFAULT.withSpeedUnit(SpeedUnit.KNOT));
        assertEquals(5 * KN, s.eastwardMs(0), TOL); // west wind blows eastward

        // units known to the netCDF unit table are accepted too: 100 cm/s = 1 m/s
        StationWindSeries cm = StationWindCsv.read(write("cm.csv", "time,u [cm/s],v [cm/s]\n2026-01-01T00:00Z,100,-50\n"));
        assertEquals(1.0, cm.eastwardMs(0), TOL);
        assertEquals(-0.5, cm.northwardMs(0), TOL);

        CsvFormatException both = assertThrows(CsvFormatException.class, () -> StationWindCsv.read(write("both.csv",
                "time,speed [m/s],direction,u [m/s],v [m/s]\n2026-01-01T00:00Z,5,10,1,2\n")));
        assertEquals(Problem.AMBIGUOUS_COLUMNS, both.problem());
        StationWindSeries chosen = StationWindCsv.read(both.file(), StationWindCsv.Options.DEFAULT.withComponents("u", "v"));
        assertEquals(2.0, chosen.northwardMs(0), 0);

        CsvFormatException missing = assertThrows(CsvFormatException.class, () -> StationWindCsv.read(write("m.csv",
                "time,pressure [hPa]\n2026-01-01T00:00Z,1013\n")));
        assertEquals(Problem.MISSING_COLUMN, missing.problem());
    }

    @Test
    void speedUnitFactorsAreExact() {
        // BIPM SI Brochure (2019) Table 8: 1 knot = 1852/3600 m/s; km/h by definition; mph = 0.44704 m/s (1959)
        assertEquals(1852.0 / 3600.0, SpeedUnit.parse("kt").orElseThrow().toMetrePerSecond(), 0);
        assertEquals(1.0 / 3.6, SpeedUnit.parse("km/h").orElseThrow().toMetrePerSecond(), 1e-16);
        assertEquals(0.44704, SpeedUnit.parse("MPH").orElseThrow().toMetrePerSecond(), 0);
        assertEquals(SpeedUnit.METRE_PER_SECOND, SpeedUnit.parse("m s-1").orElseThrow());
        assertTrue(SpeedUnit.parse("Bft").isEmpty());
    }
}
