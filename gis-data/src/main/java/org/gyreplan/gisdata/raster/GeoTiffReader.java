package org.gyreplan.gisdata.raster;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.HashMap;
import java.util.Map;
import java.util.zip.DataFormatException;
import java.util.zip.Inflater;

/**
 * Reads single-band GeoTIFF rasters on a geographic (longitude/latitude) grid, as used for bathymetry:
 * classic TIFF (little- or big-endian), strips or tiles, uncompressed or Deflate (codes 8 and 32946, predictor 1),
 * samples Int8/UInt8, Int16/UInt16, Int32/UInt32, Float32 or Float64 — this covers what GDAL writes by default
 * ({@code gdal_translate} without creation options: uncompressed strips) and its common DEFLATE/TILED options.
 * The georeference comes from ModelPixelScale + ModelTiepoint (no rotation); GTRasterTypeGeoKey PixelIsPoint
 * is honoured; GDAL_NODATA values become NaN. BigTIFF, LZW, predictors and multi-band images are reported as
 * unsupported with the file name.
 */
public final class GeoTiffReader {
    private GeoTiffReader() {}

    /**
     * A raster: values row-major with row 0 the NORTHERNMOST (as stored), georeferenced by edges.
     *
     * @param width   columns
     * @param height  rows
     * @param westDeg longitude of the western edge of column 0
     * @param northDeg latitude of the northern edge of row 0
     * @param dLonDeg pixel width, degrees
     * @param dLatDeg pixel height, degrees (positive)
     * @param values  values (NaN for nodata), length width·height
     * @param epsg    GeographicTypeGeoKey (e.g. 4326), or 0 if absent
     */
    public record Raster(int width, int height, double westDeg, double northDeg, double dLonDeg, double dLatDeg,
                         double[] values, int epsg) {
        /** As a field on a {@link LonLatGrid} with latitude ascending (rows flipped). */
        public ScalarField toField(String name, String units, String longName) {
            LonLatGrid g = new LonLatGrid(width, height, westDeg + dLonDeg / 2, northDeg - height * dLatDeg + dLatDeg / 2,
                    dLonDeg, dLatDeg, PhysicalConstants.DEFAULT.earthRadius(), null);
            double[] v = new double[width * height];
            for (int r = 0; r < height; r++) System.arraycopy(values, r * width, v, (height - 1 - r) * width, width);
            return new ScalarField(g, v, name, units, longName);
        }
    }

    /** Reads the first image of a GeoTIFF file. */
    public static Raster read(Path file) throws IOException {
        try (FileChannel ch = FileChannel.open(file, StandardOpenOption.READ)) {
            long size = ch.size();
            if (size > Integer.MAX_VALUE) throw new IOException(file + ": GeoTIFF larger than 2 GB is not supported");
            ByteBuffer b = ByteBuffer.allocate((int) size);
            while (b.hasRemaining()) if (ch.read(b, b.position()) < 0) break;
            b.flip();
            return parse(file, b);
        }
    }

    private static IOException bad(Path f, String msg) { return new IOException(f + ": " + msg); }

    private static Raster parse(Path f, ByteBuffer b) throws IOException {
        if (b.remaining() < 8) throw bad(f, "not a TIFF file: shorter than a TIFF header (expected 'II*\\0' or 'MM\\0*')");
        byte b0 = b.get(0), b1 = b.get(1);
        if (b0 == 'I' && b1 == 'I') b.order(ByteOrder.LITTLE_ENDIAN);
        else if (b0 == 'M' && b1 == 'M') b.order(ByteOrder.BIG_ENDIAN);
        else throw bad(f, "not a TIFF file: expected the byte-order mark 'II' or 'MM'");
        int magic = b.getShort(2) & 0xffff;
        if (magic == 43) throw bad(f, "BigTIFF is not supported; convert with gdal_translate -co BIGTIFF=NO");
        if (magic != 42) throw bad(f, "not a TIFF file: magic number " + magic + ", expected 42");
        long ifd = b.getInt(4) & 0xffffffffL;
        if (ifd + 2 > b.limit()) throw bad(f, "truncated TIFF: first directory at " + ifd + " beyond the end");
        int n = b.getShort((int) ifd) & 0xffff;
        Map<Integer, long[]> num = new HashMap<>();
        Map<Integer, double[]> dbl = new HashMap<>();
        Map<Integer, String> txt = new HashMap<>();
        for (int k = 0; k < n; k++) {
            int e = (int) ifd + 2 + 12 * k;
            if (e + 12 > b.limit()) throw bad(f, "truncated TIFF directory");
            int tag = b.getShort(e) & 0xffff, type = b.getShort(e + 2) & 0xffff;
            long count = b.getInt(e + 4) & 0xffffffffL;
            int tsize = switch (type) { case 1, 2, 6, 7 -> 1; case 3, 8 -> 2; case 4, 9, 11 -> 4; case 5, 10, 12 -> 8; default -> 0; };
            if (tsize == 0) continue;
            long bytes = count * tsize;
            int at = bytes <= 4 ? e + 8 : b.getInt(e + 8);
            if (at < 0 || at + bytes > b.limit()) throw bad(f, "truncated TIFF: tag " + tag + " points beyond the end");
            if (type == 2) {
                byte[] s = new byte[(int) count];
                for (int i = 0; i < count; i++) s[i] = b.get(at + i);
                int end = s.length;
                while (end > 0 && s[end - 1] == 0) end--;
                txt.put(tag, new String(s, 0, end, StandardCharsets.ISO_8859_1));
            } else if (type == 12 || type == 11) {
                double[] d = new double[(int) count];
                for (int i = 0; i < count; i++) d[i] = type == 12 ? b.getDouble(at + 8 * i) : b.getFloat(at + 4 * i);
                dbl.put(tag, d);
            } else {
                long[] v = new long[(int) count];
                for (int i = 0; i < count; i++) {
                    v[i] = switch (type) {
                        case 1, 7 -> b.get(at + i) & 0xff;
                        case 6 -> b.get(at + i);
                        case 3 -> b.getShort(at + 2 * i) & 0xffff;
                        case 8 -> b.getShort(at + 2 * i);
                        case 4 -> b.getInt(at + 4 * i) & 0xffffffffL;
                        case 9 -> b.getInt(at + 4 * i);
                        default -> 0;
                    };
                }
                num.put(tag, v);
            }
        }
        int width = (int) one(f, num, 256, -1), height = (int) one(f, num, 257, -1);
        int bits = (int) one(f, num, 258, 1);
        int compression = (int) one(f, num, 259, 1);
        int spp = (int) one(f, num, 277, 1);
        int sampleFormat = (int) one(f, num, 339, 1);
        int predictor = (int) one(f, num, 317, 1);
        if (spp != 1) throw bad(f, "has " + spp + " samples per pixel; expected a single-band raster");
        if (compression != 1 && compression != 8 && compression != 32946) {
            throw bad(f, "compression " + compression + " is not supported (expected none or Deflate); "
                    + "convert with gdal_translate -co COMPRESS=DEFLATE or without compression");
        }
        if (predictor != 1) throw bad(f, "predictor " + predictor + " is not supported; expected none (1)");
        if (width <= 0 || height <= 0) throw bad(f, "missing image size");
        double[] scale = dbl.get(33550), tie = dbl.get(33922);
        if (scale == null || tie == null || tie.length < 6) {
            throw bad(f, "not georeferenced: expected ModelPixelScaleTag and ModelTiepointTag (ModelTransformation is not supported)");
        }
        int epsg = 0, rasterType = 1, model = 0;
        long[] keys = num.get(34735);
        if (keys != null) {
            for (int k = 4; k + 3 < keys.length; k += 4) {
                if (keys[k + 1] != 0) continue;
                if (keys[k] == 2048) epsg = (int) keys[k + 3];
                if (keys[k] == 1025) rasterType = (int) keys[k + 3];
                if (keys[k] == 1024) model = (int) keys[k + 3];
            }
        }
        if (model == 1) throw bad(f, "is in a projected coordinate system; expected geographic longitude/latitude (EPSG:4326)");
        double dx = scale[0], dy = scale[1];
        double west = tie[3] - tie[0] * dx, north = tie[4] + tie[1] * dy;
        if (rasterType == 2) { west -= dx / 2; north += dy / 2; } // PixelIsPoint: tie point at the pixel centre
        double nodata = Double.NaN;
        String nd = txt.get(42113);
        if (nd != null && !nd.isBlank()) {
            try { nodata = Double.parseDouble(nd.trim()); } catch (NumberFormatException e) { throw bad(f, "GDAL_NODATA '" + nd + "' is not a number"); }
        }
        double[] out = new double[width * height];
        boolean tiled = num.containsKey(322);
        int blockW = tiled ? (int) one(f, num, 322, -1) : width;
        int blockH = tiled ? (int) one(f, num, 323, -1) : (int) Math.min(height, one(f, num, 278, height));
        long[] offsets = num.get(tiled ? 324 : 273), counts = num.get(tiled ? 325 : 279);
        if (offsets == null || counts == null) throw bad(f, "missing strip/tile offsets");
        int bps = bits / 8;
        boolean float32 = sampleFormat == 3 && bits == 32; // GDAL_NODATA is decimal text: compare in float
        int across = (width + blockW - 1) / blockW;
        for (int blk = 0; blk < offsets.length; blk++) {
            int bx = (blk % across) * blockW, by = (blk / across) * blockH;
            if (by >= height) break;
            if (offsets[blk] + counts[blk] > b.limit()) throw bad(f, "truncated TIFF: image block " + blk + " ends beyond the file");
            byte[] raw = new byte[(int) counts[blk]];
            b.get((int) offsets[blk], raw);
            int rows = tiled ? blockH : Math.min(blockH, height - by);
            int expected = blockW * rows * bps;
            if (compression != 1) raw = inflate(f, raw, expected);
            ByteBuffer bb = ByteBuffer.wrap(raw).order(b.order());
            for (int r = 0; r < rows && by + r < height; r++) {
                for (int c = 0; c < blockW && bx + c < width; c++) {
                    int p = (r * blockW + c) * bps;
                    if (p + bps > raw.length) throw bad(f, "image block " + blk + " is shorter than expected");
                    double v = sample(bb, p, bits, sampleFormat, f);
                    boolean isNoData = v == nodata || (float32 && (float) v == (float) nodata);
                    out[(by + r) * width + bx + c] = (isNoData || Double.isNaN(v)) ? Double.NaN : v;
                }
            }
        }
        return new Raster(width, height, west, north, dx, dy, out, epsg);
    }

    private static double sample(ByteBuffer bb, int p, int bits, int fmt, Path f) throws IOException {
        if (fmt == 3) {
            if (bits == 32) return bb.getFloat(p);
            if (bits == 64) return bb.getDouble(p);
        } else if (fmt == 1) {
            if (bits == 8) return bb.get(p) & 0xff;
            if (bits == 16) return bb.getShort(p) & 0xffff;
            if (bits == 32) return bb.getInt(p) & 0xffffffffL;
        } else if (fmt == 2) {
            if (bits == 8) return bb.get(p);
            if (bits == 16) return bb.getShort(p);
            if (bits == 32) return bb.getInt(p);
        }
        throw bad(f, "sample format " + fmt + " with " + bits + " bits is not supported");
    }

    private static byte[] inflate(Path f, byte[] raw, int expected) throws IOException {
        Inflater inf = new Inflater();
        inf.setInput(raw);
        ByteArrayOutputStream o = new ByteArrayOutputStream(expected);
        byte[] buf = new byte[1 << 16];
        try {
            while (!inf.finished()) {
                int k = inf.inflate(buf);
                if (k == 0 && (inf.needsInput() || inf.needsDictionary())) break;
                o.write(buf, 0, k);
            }
        } catch (DataFormatException e) {
            throw bad(f, "corrupt Deflate data: " + e.getMessage());
        } finally {
            inf.end();
        }
        return o.toByteArray();
    }

    private static long one(Path f, Map<Integer, long[]> num, int tag, long dflt) throws IOException {
        long[] v = num.get(tag);
        if (v == null || v.length == 0) {
            if (dflt < 0) throw bad(f, "missing TIFF tag " + tag);
            return dflt;
        }
        return v[0];
    }
}
