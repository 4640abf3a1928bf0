package org.gyreplan.gisdata.csv;

import org.gyreplan.gisdata.csv.CsvFormatException.Problem;
import org.gyreplan.gisdata.units.UnitConversions;
import org.gyreplan.solver.stress.WindVector;
import org.gyreplan.solver.stress.WindVectors;

import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.LocalTime;
import java.time.OffsetDateTime;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * Reads a wind series of one station from CSV (UTF-8; comma, semicolon or tab separated; lines starting with
 * {@code #} before the header are comments).
 *
 * <p>Columns are found by their header title (case-insensitive; a unit in brackets or parentheses is split off):
 * <ul>
 *   <li>time: {@code time}, {@code datetime}, {@code date_time}, {@code timestamp}, {@code time_utc} — ISO 8601,
 *       e.g. {@code 2026-01-05T06:00:00Z}, {@code 2026-01-05 06:00}, {@code 2026-01-05T06:00+02:00}; or a
 *       {@code date} column ({@code 2026-01-05}) with a {@code time} column ({@code 06:00[:ss]}). Times without
 *       offset are taken in {@link Options#zone()} (UTC by default);</li>
 *   <li>either speed ({@code speed}, {@code wind_speed}, {@code wspd}, {@code ws}, {@code ff}) and direction
 *       ({@code direction}, {@code dir}, {@code wind_direction}, {@code wdir}, {@code wd}, {@code dd}, in degrees);</li>
 *   <li>or components u ({@code u}, {@code u10}, {@code eastward}, {@code eastward_wind}) and v ({@code v},
 *       {@code v10}, {@code northward}, {@code northward_wind}).</li>
 * </ul>
 * Speed units come from the header ({@code speed [kn]}, {@code u (m/s)}) or, for columns without one, from
 * {@link Options#speedUnit()}; a column with neither is refused. See {@link SpeedUnit} for the spellings (the
 * speed units of {@link UnitConversions} are accepted too).
 *
 * <p>Direction is meteorological: the direction the wind blows <em>from</em>, degrees clockwise from true north
 * (WMO convention; common practice), converted by the solver's {@link WindVectors#fromMeteorological}. The vector
 * the air moves toward is
 * <pre>
 *   u = −s · sin θ,   v = −s · cos θ
 * </pre>
 * with s the speed (m s⁻¹), θ the direction (degrees); a north wind (θ = 0°) gives v = −s (southward).
 *
 * <p>Gaps: an empty cell, {@code NaN} or {@code NA} gives NaN components for that time; a speed of 0 with no
 * direction is calm (0, 0). Any other unreadable cell, a direction outside 0…360°, a negative speed or a time that
 * does not increase is refused with the file, line and column.
 */
public final class StationWindCsv {
    private StationWindCsv() {}

    /**
     * Options.
     *
     * @param speedUnit unit of speed/u/v columns whose header has none, or {@code null} (then the header must say)
     * @param zone      zone for times written without offset (default UTC)
     * @param timeColumn,speedColumn,directionColumn,uColumn,vColumn column titles (without unit) to use instead of
     *                  detection, or {@code null}
     */
    public record Options(SpeedUnit speedUnit, ZoneId zone, String timeColumn, String speedColumn,
                          String directionColumn, String uColumn, String vColumn) {
        /** Units from the header only, times in UTC, columns detected. */
        public static final Options DEFAULT = new Options(null, ZoneOffset.UTC, null, null, null, null, null);

        public Options {
            if (zone == null) zone = ZoneOffset.UTC;
        }

        /** These options with a default speed unit. */
        public Options withSpeedUnit(SpeedUnit u) {
            return new Options(u, zone, timeColumn, speedColumn, directionColumn, uColumn, vColumn);
        }

        /** These options with a zone for times without offset. */
        public Options withZone(ZoneId z) {
            return new Options(speedUnit, z, timeColumn, speedColumn, directionColumn, uColumn, vColumn);
        }

        /** These options with explicit speed and direction columns. */
        public Options withSpeedDirection(String speed, String direction) {
            return new Options(speedUnit, zone, timeColumn, speed, direction, null, null);
        }

        /** These options with explicit u and v columns. */
        public Options withComponents(String u, String v) {
            return new Options(speedUnit, zone, timeColumn, null, null, u, v);
        }
    }

    private static final Set<String> TIME = Set.of("time", "datetime", "date_time", "timestamp", "time_utc", "datetime_utc");
    private static final Set<String> DATE = Set.of("date");
    private static final Set<String> SPEED = Set.of("speed", "wind_speed", "windspeed", "wspd", "ws", "ff");
    private static final Set<String> DIR = Set.of("direction", "dir", "wind_direction", "winddir", "wind_dir", "wdir", "wd", "dd");
    private static final Set<String> U = Set.of("u", "u10", "eastward", "eastward_wind", "u_wind", "uwind");
    private static final Set<String> V = Set.of("v", "v10", "northward", "northward_wind", "v_wind", "vwind");

    /** A header title split into a normalised name and an optional unit. */
    private record Title(String raw, String name, String unit) {
        static Title of(String raw) {
            String t = raw.trim();
            String unit = null;
            int open = Math.max(t.lastIndexOf('['), t.lastIndexOf('('));
            if (open > 0 && (t.endsWith("]") || t.endsWith(")"))) {
                unit = t.substring(open + 1, t.length() - 1).trim();
                t = t.substring(0, open).trim();
            }
            return new Title(raw.trim(), t.toLowerCase(Locale.ROOT).replaceAll("[\\s-]+", "_"), unit);
        }
    }

    /** Reads with default options (units from the header, times without offset in UTC). */
    public static StationWindSeries read(Path file) throws IOException {
        return read(file, Options.DEFAULT);
    }

    /** Reads a station wind series. */
    public static StationWindSeries read(Path file, Options options) throws IOException {
        String text;
        try {
            text = StandardCharsets.UTF_8.newDecoder().decode(java.nio.ByteBuffer.wrap(Files.readAllBytes(file))).toString();
        } catch (CharacterCodingException e) {
            throw new CsvFormatException(Problem.UNREADABLE, file, 0, null, "is not UTF-8 text; save it as UTF-8");
        }
        // skip comment lines before the header
        String[] rawLines = text.split("\r\n|\n|\r", -1);
        int skip = 0;
        StringBuilder body = new StringBuilder();
        boolean headerSeen = false;
        for (String l : rawLines) {
            if (!headerSeen && (l.strip().startsWith("#") || l.isBlank())) { skip++; continue; }
            headerSeen = true;
            body.append(l).append('\n');
        }
        if (!headerSeen) throw new CsvFormatException(Problem.UNREADABLE, file, 0, null, "has no header line");
        String headerLine = body.substring(0, body.indexOf("\n"));
        char delim = CsvRecords.sniffDelimiter(headerLine);
        List<CsvRecords.Line> lines;
        try {
            lines = CsvRecords.parse(body.toString(), delim);
        } catch (IllegalArgumentException e) {
            throw new CsvFormatException(Problem.UNREADABLE, file, 0, null, e.getMessage());
        }
        final int offset = skip;
        List<Title> titles = new ArrayList<>();
        for (String h : lines.get(0).fields()) titles.add(Title.of(h));
        int headerLineNo = lines.get(0).lineNumber() + offset;

        int cTime = find(file, titles, options.timeColumn(), TIME, "time", headerLineNo, false);
        int cDate = find(file, titles, null, DATE, "date", headerLineNo, false);
        if (cTime < 0 && cDate < 0) {
            throw new CsvFormatException(Problem.MISSING_COLUMN, file, headerLineNo, null, "no time column; expected one of "
                    + TIME + " (ISO 8601) or a \"date\" column with a \"time\" column; header is " + raw(titles));
        }
        // columns named in the options choose the pair; the other pair is then not looked for
        boolean namedPolar = options.speedColumn() != null || options.directionColumn() != null;
        boolean namedCart = options.uColumn() != null || options.vColumn() != null;
        int cSpeed = namedCart && !namedPolar ? -1 : find(file, titles, options.speedColumn(), SPEED, "speed", headerLineNo, false);
        int cDir = namedCart && !namedPolar ? -1 : find(file, titles, options.directionColumn(), DIR, "direction", headerLineNo, false);
        int cU = namedPolar && !namedCart ? -1 : find(file, titles, options.uColumn(), U, "eastward (u)", headerLineNo, false);
        int cV = namedPolar && !namedCart ? -1 : find(file, titles, options.vColumn(), V, "northward (v)", headerLineNo, false);
        boolean polar = cSpeed >= 0 && cDir >= 0, cart = cU >= 0 && cV >= 0;
        if (polar && cart) {
            throw new CsvFormatException(Problem.AMBIGUOUS_COLUMNS, file, headerLineNo, null, "has both speed/direction ("
                    + titles.get(cSpeed).raw() + ", " + titles.get(cDir).raw() + ") and u/v (" + titles.get(cU).raw() + ", "
                    + titles.get(cV).raw() + ") columns; choose one pair in the options");
        }
        if (!polar && !cart) {
            throw new CsvFormatException(Problem.MISSING_COLUMN, file, headerLineNo, null, "needs wind speed and direction"
                    + " columns (e.g. \"speed [kn]\", \"direction [deg]\") or u and v columns (e.g. \"u [m/s]\", \"v [m/s]\");"
                    + " header is " + raw(titles));
        }
        double fA = speedFactor(file, titles.get(polar ? cSpeed : cU), options, headerLineNo);
        double fB = polar ? 1 : speedFactor(file, titles.get(cV), options, headerLineNo);
        if (polar) {
            String du = titles.get(cDir).unit();
            if (du != null && !Set.of("deg", "degree", "degrees", "°", "degrees true", "deg true", "°t", "degt")
                    .contains(du.toLowerCase(Locale.ROOT))) {
                throw new CsvFormatException(Problem.UNKNOWN_UNIT, file, headerLineNo, titles.get(cDir).raw(), "direction unit \""
                        + du + "\" is not supported; expected degrees clockwise from true north (deg)");
            }
        }
        boolean dateAndTime = cDate >= 0 && cTime >= 0 && !looksLikeDateTime(lines, cTime);
        if (cTime < 0) dateAndTime = false;

        int n = lines.size() - 1;
        Instant[] times = new Instant[n];
        double[] u = new double[n], v = new double[n];
        for (int r = 1; r <= n; r++) {
            CsvRecords.Line line = lines.get(r);
            int lineNo = line.lineNumber() + offset;
            List<String> f = line.fields();
            if (f.size() != titles.size()) {
                throw new CsvFormatException(Problem.BAD_VALUE, file, lineNo, null, "has " + f.size() + " fields, the header has "
                        + titles.size());
            }
            Instant t;
            if (dateAndTime) {
                t = dateTime(file, lineNo, titles.get(cDate).raw(), f.get(cDate), titles.get(cTime).raw(), f.get(cTime), options.zone());
            } else if (cTime >= 0) {
                t = instant(file, lineNo, titles.get(cTime).raw(), f.get(cTime), options.zone());
            } else {
                t = instant(file, lineNo, titles.get(cDate).raw(), f.get(cDate), options.zone());
            }
            if (r > 1 && !t.isAfter(times[r - 2])) {
                throw new CsvFormatException(Problem.TIME_NOT_INCREASING, file, lineNo, titles.get(cTime >= 0 ? cTime : cDate).raw(),
                        "time " + t + " does not come after the previous time " + times[r - 2]
                                + "; sort the file and remove duplicates");
            }
            times[r - 1] = t;
            if (polar) {
                double s = number(file, lineNo, titles.get(cSpeed).raw(), f.get(cSpeed));
                double d = number(file, lineNo, titles.get(cDir).raw(), f.get(cDir));
                if (s < 0) {
                    throw new CsvFormatException(Problem.BAD_VALUE, file, lineNo, titles.get(cSpeed).raw(), "speed " + f.get(cSpeed)
                            + " is negative");
                }
                if (d < 0 || d > 360) {
                    throw new CsvFormatException(Problem.BAD_VALUE, file, lineNo, titles.get(cDir).raw(), "direction "
                            + f.get(cDir) + " is outside 0…360 degrees");
                }
                s *= fA;
                if (s == 0) {
                    u[r - 1] = 0;
                    v[r - 1] = 0;
                } else if (Double.isNaN(s) || Double.isNaN(d)) {
                    u[r - 1] = Double.NaN;
                    v[r - 1] = Double.NaN;
                } else {
                    WindVector w = WindVectors.fromMeteorological(s, d);
                    u[r - 1] = w.eastward();
                    v[r - 1] = w.northward();
                }
            } else {
                double a = number(file, lineNo, titles.get(cU).raw(), f.get(cU)) * fA;
                double b = number(file, lineNo, titles.get(cV).raw(), f.get(cV)) * fB;
                boolean gap = Double.isNaN(a) || Double.isNaN(b);
                u[r - 1] = gap ? Double.NaN : a;
                v[r - 1] = gap ? Double.NaN : b;
            }
        }
        return new StationWindSeries(file.getFileName().toString(), times, u, v);
    }

    private static String raw(List<Title> titles) {
        List<String> r = new ArrayList<>();
        for (Title t : titles) r.add(t.raw());
        return r.toString();
    }

    private static int find(Path file, List<Title> titles, String explicit, Set<String> names, String role, int line,
                            boolean required) throws CsvFormatException {
        if (explicit != null) {
            String want = Title.of(explicit).name();
            for (int k = 0; k < titles.size(); k++) if (titles.get(k).name().equals(want)) return k;
            throw new CsvFormatException(Problem.MISSING_COLUMN, file, line, explicit, "the " + role
                    + " column named in the options is not in the header " + raw(titles));
        }
        int found = -1;
        for (int k = 0; k < titles.size(); k++) {
            if (names.contains(titles.get(k).name())) {
                if (found >= 0) {
                    throw new CsvFormatException(Problem.AMBIGUOUS_COLUMNS, file, line, null, "columns \""
                            + titles.get(found).raw() + "\" and \"" + titles.get(k).raw() + "\" could both be the " + role
                            + " column; name the one to use in the options");
                }
                found = k;
            }
        }
        return found;
    }

    private static double speedFactor(Path file, Title t, Options o, int line) throws CsvFormatException {
        if (t.unit() != null) {
            var known = SpeedUnit.parse(t.unit());
            if (known.isPresent()) return known.get().toMetrePerSecond();
            if (UnitConversions.isKnown(UnitConversions.Quantity.SPEED, t.unit())) {
                return UnitConversions.factorToSI(UnitConversions.Quantity.SPEED, t.unit());
            }
            throw new CsvFormatException(Problem.UNKNOWN_UNIT, file, line, t.raw(), "unknown speed unit \"" + t.unit()
                    + "\"; accepted: " + SpeedUnit.accepted() + " (and the speed units of the netCDF reader, e.g. cm/s)");
        }
        if (o.speedUnit() != null) return o.speedUnit().toMetrePerSecond();
        throw new CsvFormatException(Problem.UNKNOWN_UNIT, file, line, t.raw(), "no speed unit; write it in the header"
                + " (e.g. \"" + t.raw() + " [m/s]\", \"[kn]\", \"[km/h]\") or give it in the options");
    }

    private static double number(Path file, int line, String column, String cell) throws CsvFormatException {
        String c = cell.trim();
        if (c.isEmpty() || c.equalsIgnoreCase("nan") || c.equalsIgnoreCase("na")) return Double.NaN;
        try {
            double d = Double.parseDouble(c);
            if (Double.isInfinite(d)) throw new NumberFormatException();
            return d;
        } catch (NumberFormatException e) {
            throw new CsvFormatException(Problem.BAD_VALUE, file, line, column, "\"" + cell
                    + "\" is not a number (use '.' as decimal mark; leave the cell empty or write NaN for a gap)");
        }
    }

    private static boolean looksLikeDateTime(List<CsvRecords.Line> lines, int col) {
        if (lines.size() < 2) return false;
        String s = lines.get(1).fields().size() > col ? lines.get(1).fields().get(col).trim() : "";
        return s.length() >= 10 && s.charAt(4) == '-' && s.charAt(7) == '-';
    }

    static Instant instant(Path file, int line, String column, String cell, ZoneId zone) throws CsvFormatException {
        String s = cell.trim();
        if (s.length() > 10 && s.charAt(10) == ' ') s = s.substring(0, 10) + 'T' + s.substring(11).trim();
        try {
            if (s.length() == 10) return LocalDate.parse(s).atStartOfDay(zone).toInstant();
            if (s.endsWith("Z") || s.endsWith("z") || s.matches(".*T.*[+-]\\d\\d(:?\\d\\d)?$")) {
                String z = s.replaceAll("([+-]\\d\\d)(\\d\\d)$", "$1:$2");
                if (z.matches(".*[+-]\\d\\d$")) z = z + ":00";
                return OffsetDateTime.parse(z.replace('z', 'Z')).toInstant();
            }
            return LocalDateTime.parse(s).atZone(zone).toInstant();
        } catch (DateTimeParseException e) {
            throw new CsvFormatException(Problem.BAD_VALUE, file, line, column, "\"" + cell
                    + "\" is not an ISO 8601 time (e.g. 2026-01-05T06:00:00Z or 2026-01-05 06:00)");
        }
    }

    private static Instant dateTime(Path file, int line, String dateCol, String date, String timeCol, String time, ZoneId zone)
            throws CsvFormatException {
        LocalDate d;
        try {
            d = LocalDate.parse(date.trim());
        } catch (DateTimeParseException e) {
            throw new CsvFormatException(Problem.BAD_VALUE, file, line, dateCol, "\"" + date + "\" is not an ISO 8601 date (e.g. 2026-01-05)");
        }
        String t = time.trim();
        if (t.matches("\\d:\\d\\d(:\\d\\d)?")) t = "0" + t;
        try {
            return LocalDateTime.of(d, LocalTime.parse(t)).atZone(zone).toInstant();
        } catch (DateTimeParseException e) {
            throw new CsvFormatException(Problem.BAD_VALUE, file, line, timeCol, "\"" + time + "\" is not a time of day (e.g. 06:00)");
        }
    }
}
