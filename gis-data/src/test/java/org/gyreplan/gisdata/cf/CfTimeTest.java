package org.gyreplan.gisdata.cf;

import org.gyreplan.gisdata.netcdf.NetcdfDataset;
import org.gyreplan.gisdata.netcdf.RealData;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.junit.jupiter.api.Assertions.*;

/**
 * CF time decoding (CF Conventions 1.8 §4.4.1) with hand-worked dates. Calendar facts used: the Gregorian reform
 * (Thursday 4 October 1582 Julian was followed by Friday 15 October 1582 Gregorian); the Julian calendar is 10
 * days behind the Gregorian from 1 March 1500 to 28 February 1700 (9 days from 1 March 1400), and 13 days from
 * 1 March 1900 to 28 February 2100 — common practice (e.g. Meeus, Astronomical Algorithms, 1998, ch. 7).
 * Exact arithmetic: tolerance 0 unless stated.
 */
class CfTimeTest {
    private static Instant at(String iso) { return Instant.parse(iso); }

    @Test
    void standardCalendarAfterTheReformIsGregorian() {
        assertEquals(Instant.EPOCH, CfTime.parse("days since 1970-01-01", "standard").toInstant(0));
        assertEquals(at("1980-01-14T14:00:00Z"), CfTime.parse("hour since 1980-01-14 14:00:00", null).toInstant(0));
        // 2000 is a leap year: 59 days after 1 January is 29 February
        assertEquals(at("2000-02-29T00:00:00Z"), CfTime.parse("days since 2000-01-01", "gregorian").toInstant(59));
        assertEquals(at("2000-01-01T06:30:00Z"), CfTime.parse("minutes since 2000-01-01T00:00:00Z", null).toInstant(390));
        assertEquals(at("1999-12-31T23:00:00Z"), CfTime.parse("hours since 2000-01-01 00:00:00 +01:00", null).toInstant(0));
        assertEquals(at("2000-01-01T00:00:01.500Z"), CfTime.parse("seconds since 2000-01-01", null).toInstant(1.5));
    }

    @Test
    void standardCalendarCrossesTheGregorianReform() {
        // Julian 1582-10-04 + 1 day = Gregorian 1582-10-15
        assertEquals(at("1582-10-15T00:00:00Z"), CfTime.parse("days since 1582-10-04", "standard").toInstant(1));
        // a reference date before the reform is a Julian date: Julian 1500-01-01 = Gregorian 1500-01-10
        assertEquals(at("1500-01-10T00:00:00Z"), CfTime.parse("days since 1500-01-01", "standard").toInstant(0));
        assertEquals(at("1500-01-01T00:00:00Z"), CfTime.parse("days since 1500-01-01", "proleptic_gregorian").toInstant(0));
    }

    @Test
    void julianCalendar() {
        // Julian 1900-01-01 = Gregorian 1900-01-13 (12 days before 1 March 1900)
        assertEquals(at("1900-01-13T00:00:00Z"), CfTime.parse("days since 1900-01-01", "julian").toInstant(0));
        // 1900 is a Julian leap year: Julian 1900-02-29 exists, = Gregorian 1900-03-13
        assertEquals(at("1900-03-13T00:00:00Z"), CfTime.parse("days since 1900-01-01", "julian").toInstant(59));
    }

    @Test
    void noLeapCalendarSkipsFebruary29() {
        CfTime t = CfTime.parse("days since 2000-01-01", "noleap");
        assertEquals(at("2000-03-01T00:00:00Z"), t.toInstant(59));
        assertEquals(at("2001-01-01T00:00:00Z"), t.toInstant(365));
        assertEquals(at("2001-01-01T00:00:00Z"), CfTime.parse("days since 2000-01-01", "365_day").toInstant(365));
        // proleptic Gregorian for contrast: 365 days after 2000-01-01 is 2000-12-31
        assertEquals(at("2000-12-31T00:00:00Z"), CfTime.parse("days since 2000-01-01", "proleptic_gregorian").toInstant(365));
    }

    @Test
    void allLeapCalendarMapsByFractionOfYear() {
        // all_leap 2001-02-29 (day 59 of 366) → 59/366 of the 365-day year 2001 = 58.838798 days
        // = 2001-02-28 20:07:52.131 (hand-worked); tolerance 1 ms
        Instant got = CfTime.parse("days since 2001-01-01", "all_leap").toInstant(59);
        assertEquals(0, Duration.between(at("2001-02-28T20:07:52.131Z"), got).toMillis());
        assertEquals(at("2002-01-01T00:00:00Z"), CfTime.parse("days since 2001-01-01", "366_day").toInstant(366));
    }

    @Test
    void day360CalendarMapsByFractionOfYear() {
        // 360_day 1990-07-01 is day 180 of 360 = half the year → 1990-07-02 12:00 (182.5 days into 1990)
        assertEquals(at("1990-07-02T12:00:00Z"), CfTime.parse("days since 1990-01-01", "360_day").toInstant(180));
        // months are 30 days: 1 month after 2000-01-01 is 2000-02-01 = day 30 of 360 → 30.5 days into leap year 2000
        assertEquals(at("2000-01-31T12:00:00Z"), CfTime.parse("months since 2000-01-01", "360_day").toInstant(1));
        // 360_day 2000-02-30 exists: day 59 of 360 → 59 × 366/360 = 59.9833 days into 2000 = 2000-02-29 23:36
        assertEquals(at("2000-02-29T23:36:00Z"), CfTime.parse("days since 2000-02-30", "360_day").toInstant(0));
    }

    @Test
    void wholeCalendarMonthsInRealCalendars() {
        assertEquals(at("2000-03-15T00:00:00Z"), CfTime.parse("months since 2000-01-15", null).toInstant(2));
        assertEquals(at("1999-11-15T00:00:00Z"), CfTime.parse("months since 2000-01-15", null).toInstant(-2));
    }

    @Test
    void yearZeroClimatologyMatchesNcdump() {
        // ncdump -t coads_climatology.cdf prints TIME[0] = "0000-01-16 06" (Julian, the mixed calendar before 1582):
        // Julian 0000-01-16 = Gregorian 0000-01-14 (JDN 1721073 both; hand-worked)
        assertEquals(at("0000-01-14T06:00:00Z"), CfTime.parse("hour since 0000-01-01 00:00:00", null).toInstant(366));
    }

    @Test
    void everyNavyWindTimeMatchesNcdumpT() throws IOException {
        Path f = RealData.file("monthly_navy_winds.cdf");
        String out = RealData.run("ncdump", "-t", "-v", "TIME", f.toString());
        Matcher m = Pattern.compile("\"(\\d{4})-(\\d{2})-(\\d{2})(?: (\\d{1,2})(?::(\\d{1,2}))?(?::(\\d{1,2}))?)?\"").matcher(out);
        List<Instant> expected = new ArrayList<>();
        while (m.find()) {
            expected.add(at(String.format("%s-%s-%sT%02d:%02d:%02dZ", m.group(1), m.group(2), m.group(3),
                    m.group(4) == null ? 0 : Integer.parseInt(m.group(4)),
                    m.group(5) == null ? 0 : Integer.parseInt(m.group(5)),
                    m.group(6) == null ? 0 : Integer.parseInt(m.group(6)))));
        }
        assertEquals(132, expected.size());
        try (NetcdfDataset nc = NetcdfDataset.open(f)) {
            var tv = nc.variable("TIME");
            CfTime t = CfTime.parse(tv.textAttribute("units"), tv.textAttribute("calendar"));
            double[] v = tv.readAll();
            for (int k = 0; k < v.length; k++) {
                // ncdump -t prints to the second; our instants keep fractions
                assertEquals(0, Duration.between(expected.get(k), t.toInstant(v[k])).getSeconds(), "step " + k);
            }
        }
    }

    @Test
    void badUnitsAndCalendarsAreClearErrors() {
        var e = assertThrows(IllegalArgumentException.class, () -> CfTime.parse("fortnights since 2000-01-01", null));
        assertTrue(e.getMessage().contains("fortnights"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> CfTime.parse("days after the flood", null));
        assertTrue(e.getMessage().contains("<unit> since"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> CfTime.parse("days since 2001-02-29", "noleap"));
        assertTrue(e.getMessage().contains("does not exist"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> CfTime.parse("days since 2001-01-01", "martian"));
        assertTrue(e.getMessage().contains("martian"), e.getMessage());
    }
}
