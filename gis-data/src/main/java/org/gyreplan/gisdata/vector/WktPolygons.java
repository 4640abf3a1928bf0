package org.gyreplan.gisdata.vector;

import org.gyreplan.gisdata.vector.GeometryFileException.Problem;
import org.locationtech.jts.geom.Coordinate;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;

/**
 * Reads polygons written as OGC Well-Known Text (OGC 06-103r4 §7): {@code POLYGON ((lon lat, ...), (hole ...))}
 * or {@code MULTIPOLYGON (((...)), ((...)))}, with optional Z/M ordinates (ignored) and an optional
 * {@code SRID=4326;} prefix. A file may hold several geometries one after another; lines starting with
 * {@code #} are comments. Axis order is x = longitude, y = latitude (degrees, WGS 84).
 */
public final class WktPolygons {
    private WktPolygons() {}

    static List<PolygonFeature> read(Path file, boolean repair) throws IOException {
        StringBuilder text = new StringBuilder();
        for (String line : Files.readAllLines(file, StandardCharsets.UTF_8)) {
            if (!line.strip().startsWith("#")) text.append(line).append('\n');
        }
        return parse(file, text.toString(), repair);
    }

    /** Parses WKT text holding one or more Polygon/MultiPolygon geometries ({@code source} names it in errors). */
    public static List<PolygonFeature> parse(Path source, String text, boolean repair) throws GeometryFileException {
        Parser p = new Parser(source, text);
        List<PolygonFeature> out = new ArrayList<>();
        p.ws();
        while (p.pos < text.length()) {
            int index = out.size();
            PolygonAssembly a = new PolygonAssembly(source, index, null, repair);
            p.assembly = a;
            if (text.regionMatches(true, p.pos, "SRID=", 0, 5)) {
                int semi = text.indexOf(';', p.pos);
                if (semi < 0) throw a.error(Problem.UNREADABLE, null, "SRID= prefix without ';'");
                String srid = text.substring(p.pos + 5, semi).trim();
                if (!srid.equals("4326")) {
                    throw a.error(Problem.UNSUPPORTED_CRS, null, "declares SRID=" + srid
                            + "; expected WGS 84 longitude/latitude (SRID=4326)");
                }
                p.pos = semi + 1;
                p.ws();
            }
            String type = p.word().toUpperCase(Locale.ROOT);
            p.ws();
            String dims = "";
            int save = p.pos;
            String maybe = p.word().toUpperCase(Locale.ROOT);
            if (maybe.equals("Z") || maybe.equals("M") || maybe.equals("ZM")) dims = maybe; else p.pos = save;
            p.ws();
            List<List<Coordinate[]>> parts = new ArrayList<>();
            if (type.equals("POLYGON")) {
                parts.add(p.rings());
            } else if (type.equals("MULTIPOLYGON")) {
                p.expect('(');
                do { p.ws(); parts.add(p.rings()); p.ws(); } while (p.comma());
                p.expect(')');
            } else if (type.isEmpty()) {
                throw a.error(Problem.UNREADABLE, null, "expected a WKT geometry keyword near character " + p.pos);
            } else {
                throw a.error(Problem.NOT_POLYGON, null, "geometry type is " + type
                        + "; a basin, exclusion zone or study area must be a POLYGON or MULTIPOLYGON");
            }
            if (!dims.isEmpty() && dims.length() > 2) throw a.error(Problem.UNREADABLE, null, "bad dimension " + dims);
            out.add(a.feature(a.polygonal(parts), new LinkedHashMap<>()));
            p.ws();
            if (p.pos < text.length() && text.charAt(p.pos) == ';') { p.pos++; p.ws(); }
        }
        if (out.isEmpty()) throw new GeometryFileException(Problem.NO_POLYGONS, source, -1, null, null, "no WKT geometry found");
        return out;
    }

    private static final class Parser {
        final Path file;
        final String s;
        int pos;
        PolygonAssembly assembly;

        Parser(Path file, String s) { this.file = file; this.s = s; }

        void ws() { while (pos < s.length() && Character.isWhitespace(s.charAt(pos))) pos++; }

        String word() {
            int st = pos;
            while (pos < s.length() && Character.isLetter(s.charAt(pos))) pos++;
            return s.substring(st, pos);
        }

        GeometryFileException err(String what) {
            return assembly.error(Problem.UNREADABLE, null, "WKT syntax: " + what + " near character " + pos);
        }

        void expect(char c) throws GeometryFileException {
            ws();
            if (pos >= s.length() || s.charAt(pos) != c) {
                if (c == '(' && s.regionMatches(true, pos, "EMPTY", 0, 5)) {
                    throw assembly.error(Problem.NOT_POLYGON, null, "the geometry is EMPTY; expected a polygon with coordinates");
                }
                throw err("expected '" + c + "'");
            }
            pos++;
        }

        boolean comma() {
            ws();
            if (pos < s.length() && s.charAt(pos) == ',') { pos++; return true; }
            return false;
        }

        List<Coordinate[]> rings() throws GeometryFileException {
            List<Coordinate[]> rings = new ArrayList<>();
            expect('(');
            do { rings.add(ring()); } while (comma());
            expect(')');
            return rings;
        }

        Coordinate[] ring() throws GeometryFileException {
            List<Coordinate> pts = new ArrayList<>();
            expect('(');
            do {
                ws();
                double x = number();
                ws();
                double y = number();
                ws();
                while (pos < s.length() && (s.charAt(pos) == '-' || s.charAt(pos) == '+' || s.charAt(pos) == '.'
                        || Character.isDigit(s.charAt(pos)))) {
                    number();
                    ws();
                }
                pts.add(new Coordinate(x, y));
            } while (comma());
            expect(')');
            return pts.toArray(new Coordinate[0]);
        }

        double number() throws GeometryFileException {
            int st = pos;
            while (pos < s.length() && "+-.eE0123456789".indexOf(s.charAt(pos)) >= 0) pos++;
            if (st == pos) {
                if (s.regionMatches(true, pos, "NaN", 0, 3)) { pos += 3; return Double.NaN; }
                throw err("expected a number");
            }
            try {
                return Double.parseDouble(s.substring(st, pos));
            } catch (NumberFormatException e) {
                pos = st;
                throw err("bad number '" + s.substring(st, Math.min(s.length(), st + 20)) + "'");
            }
        }
    }
}
