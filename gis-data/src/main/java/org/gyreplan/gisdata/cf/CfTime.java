package org.gyreplan.gisdata.cf;

import java.time.Instant;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Decodes CF time coordinates ({@code units = "<unit> since <reference date>"}, {@code calendar = ...}) to UTC
 * {@link Instant}s, per CF Conventions 1.8 §4.4.
 *
 * <pre>
 *   t = reference + value × unit
 * </pre>
 *
 * Units: seconds (s, sec), minutes (min), hours (h, hr), days (d); for {@link CfCalendar#DAY_360}, months
 * (30 days) and years (360 days); in other calendars "months since" and "years since" with whole values step
 * by calendar months or years (common practice in climatology files), and fractional values use the UDUNITS
 * definitions (1 year = 365.242198781 days, 1 month = year/12). Reference dates: "Y-M-D", "Y-M-D h:m:s(.f)",
 * "Y-M-DTh:m:sZ" and an optional time zone offset ("+hh:mm", "UTC"). Years may be 0 or negative
 * (astronomical numbering). See {@link CfCalendar} for how non-real calendars map to instants.
 *
 * <p>Instances are immutable and thread-safe.
 */
public final class CfTime {
    private static final Pattern UNITS = Pattern.compile(
            "\\s*([a-zA-Z]+)\\s+(?:since|from|after)\\s+(-?\\d{1,4})-(\\d{1,2})-(\\d{1,2})"
                    + "(?:[ T]+(\\d{1,2}):(\\d{1,2})(?::(\\d{1,2}(?:\\.\\d*)?))?)?"
                    + "\\s*(Z|UTC|GMT|[+-]\\d{1,2}(?::?\\d{2})?)?\\s*");
    private static final long DAY = 86_400L;
    /** UDUNITS year in seconds (365.242198781 days). */
    private static final double UDUNITS_YEAR = 365.242198781 * DAY;

    private enum Unit { SECOND, MINUTE, HOUR, DAY, MONTH, YEAR }

    private final String unitsText;
    private final CfCalendar calendar;
    private final Unit unit;
    private final int refYear, refMonth, refDay;
    private final double refSecondOfDay; // seconds after midnight, UTC
    /** For day-based arithmetic: day number of the reference date in the model calendar. */
    private final long refDayNumber;

    private CfTime(String unitsText, CfCalendar calendar, Unit unit, int y, int m, int d, double sod) {
        this.unitsText = unitsText;
        this.calendar = calendar;
        this.unit = unit;
        this.refYear = y;
        this.refMonth = m;
        this.refDay = d;
        this.refSecondOfDay = sod;
        this.refDayNumber = dayNumber(calendar, y, m, d);
    }

    /**
     * Parses a CF time unit string and calendar name.
     *
     * @throws IllegalArgumentException naming the string and the expected form
     */
    public static CfTime parse(String units, String calendarName) {
        CfCalendar cal = CfCalendar.parse(calendarName);
        if (units == null) throw new IllegalArgumentException("no time units; expected '<unit> since <date>'");
        Matcher m = UNITS.matcher(units);
        if (!m.matches()) {
            throw new IllegalArgumentException("time units '" + units + "' are not of the form '<unit> since "
                    + "<yyyy-mm-dd[ hh:mm:ss]>' (CF Conventions §4.4)");
        }
        Unit u = switch (m.group(1).toLowerCase(Locale.ROOT)) {
            case "s", "sec", "secs", "second", "seconds" -> Unit.SECOND;
            case "min", "mins", "minute", "minutes" -> Unit.MINUTE;
            case "h", "hr", "hrs", "hour", "hours" -> Unit.HOUR;
            case "d", "day", "days" -> Unit.DAY;
            case "month", "months", "mon" -> Unit.MONTH;
            case "year", "years", "yr", "a" -> Unit.YEAR;
            default -> throw new IllegalArgumentException("time units '" + units + "': unknown unit '" + m.group(1)
                    + "'; expected seconds, minutes, hours, days, months or years");
        };
        int y = Integer.parseInt(m.group(2)), mo = Integer.parseInt(m.group(3)), d = Integer.parseInt(m.group(4));
        double sod = 0;
        if (m.group(5) != null) {
            sod = Integer.parseInt(m.group(5)) * 3600.0 + Integer.parseInt(m.group(6)) * 60.0
                    + (m.group(7) != null ? Double.parseDouble(m.group(7)) : 0);
        }
        String tz = m.group(8);
        if (tz != null && (tz.startsWith("+") || tz.startsWith("-"))) {
            String t = tz.substring(1).replace(":", "");
            int hh, mm = 0;
            if (t.length() <= 2) hh = Integer.parseInt(t);
            else { hh = Integer.parseInt(t.substring(0, t.length() - 2)); mm = Integer.parseInt(t.substring(t.length() - 2)); }
            double off = hh * 3600.0 + mm * 60.0;
            sod -= tz.startsWith("+") ? off : -off;
        }
        if (mo < 1 || mo > 12 || d < 1 || d > monthLength(cal, y, mo)) {
            throw new IllegalArgumentException("time units '" + units + "': reference date " + y + "-" + mo + "-" + d
                    + " does not exist in the " + cal.cfName() + " calendar");
        }
        return new CfTime(units, cal, u, y, mo, d, sod);
    }

    public CfCalendar calendar() { return calendar; }
    public String units() { return unitsText; }

    /** The instant of a time coordinate value. */
    public Instant toInstant(double value) {
        if (!Double.isFinite(value)) throw new IllegalArgumentException("time value " + value + " is not finite");
        double seconds;      // offset from the reference, when the unit is a fixed duration
        switch (unit) {
            case SECOND -> seconds = value;
            case MINUTE -> seconds = value * 60;
            case HOUR -> seconds = value * 3600;
            case DAY -> seconds = value * DAY;
            case MONTH -> {
                if (calendar == CfCalendar.DAY_360) seconds = value * 30 * DAY;
                else if (value == Math.rint(value)) return addMonths((long) value);
                else seconds = value * UDUNITS_YEAR / 12;
            }
            case YEAR -> {
                if (calendar == CfCalendar.DAY_360) seconds = value * 360 * DAY;
                else if (value == Math.rint(value)) return addMonths((long) value * 12);
                else seconds = value * UDUNITS_YEAR;
            }
            default -> throw new IllegalStateException();
        }
        double totalSec = refSecondOfDay + seconds;
        long wholeDays = (long) Math.floor(totalSec / DAY);
        double sod = totalSec - wholeDays * (double) DAY;
        return fromModelDay(refDayNumber + wholeDays, sod);
    }

    private Instant addMonths(long months) {
        long m0 = (long) refYear * 12 + (refMonth - 1) + months;
        int y = (int) Math.floorDiv(m0, 12), mo = (int) Math.floorMod(m0, 12) + 1;
        int d = Math.min(refDay, monthLength(calendar, y, mo));
        double sod = refSecondOfDay;
        long extra = (long) Math.floor(sod / DAY);
        return fromModelDay(dayNumber(calendar, y, mo, d) + extra, sod - extra * (double) DAY);
    }

    /** Instant of a model day number (in this calendar) and second of day. */
    private Instant fromModelDay(long dayNum, double sod) {
        long secs;
        double frac;
        switch (calendar) {
            case STANDARD, PROLEPTIC_GREGORIAN, JULIAN -> {
                // day numbers of the real calendars are Julian Day Numbers: an absolute count
                secs = (dayNum - 2_440_588L) * DAY;
            }
            case NOLEAP -> {
                long y = Math.floorDiv(dayNum, 365);
                int doy = (int) Math.floorMod(dayNum, 365);
                int[] md = monthDay(CfCalendar.NOLEAP, (int) y, doy);
                secs = (gregorianJdn((int) y, md[0], md[1]) - 2_440_588L) * DAY;
            }
            case ALL_LEAP, DAY_360 -> {
                int len = calendar == CfCalendar.ALL_LEAP ? 366 : 360;
                long y = Math.floorDiv(dayNum, len);
                int doy = (int) Math.floorMod(dayNum, len);
                double fraction = (doy + sod / DAY) / len;
                long startJ = gregorianJdn((int) y, 1, 1), endJ = gregorianJdn((int) y + 1, 1, 1);
                double s = (startJ - 2_440_588L) * (double) DAY + fraction * (endJ - startJ) * DAY;
                long whole = (long) Math.floor(s);
                return Instant.ofEpochSecond(whole, Math.round((s - whole) * 1e9) % 1_000_000_000L);
            }
            default -> throw new IllegalStateException();
        }
        long whole = (long) Math.floor(sod);
        frac = sod - whole;
        long nanos = Math.round(frac * 1e9);
        if (nanos >= 1_000_000_000L) { whole++; nanos -= 1_000_000_000L; }
        return Instant.ofEpochSecond(secs + whole, nanos);
    }

    /** Day number of a date in a calendar: a Julian Day Number for the real calendars, a day count otherwise. */
    static long dayNumber(CfCalendar cal, int y, int m, int d) {
        return switch (cal) {
            case PROLEPTIC_GREGORIAN -> gregorianJdn(y, m, d);
            case JULIAN -> julianJdn(y, m, d);
            case STANDARD -> {
                boolean gregorian = y > 1582 || (y == 1582 && (m > 10 || (m == 10 && d >= 15)));
                yield gregorian ? gregorianJdn(y, m, d) : julianJdn(y, m, d);
            }
            case NOLEAP -> (long) y * 365 + dayOfYear(cal, y, m, d);
            case ALL_LEAP -> (long) y * 366 + dayOfYear(cal, y, m, d);
            case DAY_360 -> (long) y * 360 + (m - 1) * 30L + (d - 1);
        };
    }

    private static int dayOfYear(CfCalendar cal, int y, int m, int d) {
        int n = 0;
        for (int k = 1; k < m; k++) n += monthLength(cal, y, k);
        return n + d - 1;
    }

    private static int[] monthDay(CfCalendar cal, int y, int doy) {
        int m = 1;
        while (doy >= monthLength(cal, y, m)) { doy -= monthLength(cal, y, m); m++; }
        return new int[] {m, doy + 1};
    }

    /** Length of a month in a calendar. */
    static int monthLength(CfCalendar cal, int y, int m) {
        if (cal == CfCalendar.DAY_360) return 30;
        int[] len = {31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31};
        if (m != 2) return len[m - 1];
        boolean leap = switch (cal) {
            case NOLEAP -> false;
            case ALL_LEAP -> true;
            case JULIAN -> Math.floorMod(y, 4) == 0;
            case PROLEPTIC_GREGORIAN -> isGregorianLeap(y);
            case STANDARD -> y < 1582 ? Math.floorMod(y, 4) == 0 : isGregorianLeap(y);
            default -> false;
        };
        return leap ? 29 : 28;
    }

    private static boolean isGregorianLeap(int y) {
        return Math.floorMod(y, 4) == 0 && (Math.floorMod(y, 100) != 0 || Math.floorMod(y, 400) == 0);
    }

    /** Julian Day Number of a proleptic Gregorian date (Fliegel and Van Flandern 1968 algorithm, astronomical years). */
    static long gregorianJdn(int y, int m, int d) {
        long a = Math.floorDiv(14 - m, 12);
        long yy = y + 4800L - a;
        long mm = m + 12 * a - 3;
        return d + Math.floorDiv(153 * mm + 2, 5) + 365 * yy + Math.floorDiv(yy, 4) - Math.floorDiv(yy, 100)
                + Math.floorDiv(yy, 400) - 32045;
    }

    /** Julian Day Number of a Julian-calendar date (same algorithm family, astronomical years). */
    static long julianJdn(int y, int m, int d) {
        long a = Math.floorDiv(14 - m, 12);
        long yy = y + 4800L - a;
        long mm = m + 12 * a - 3;
        return d + Math.floorDiv(153 * mm + 2, 5) + 365 * yy + Math.floorDiv(yy, 4) - 32083;
    }

    @Override
    public String toString() { return unitsText + " (" + calendar.cfName() + ")"; }
}
