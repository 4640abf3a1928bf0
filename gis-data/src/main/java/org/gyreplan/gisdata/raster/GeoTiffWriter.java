package org.gyreplan.gisdata.raster;

import org.gyreplan.gisdata.io.AtomicWrite;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

/**
 * Writes a {@link ScalarField} as a single-band Float32 GeoTIFF in geographic WGS 84 (EPSG:4326), after the
 * TIFF 6.0 specification (Adobe, 1992) and the OGC GeoTIFF 1.1 standard (2019):
 *
 * <ul>
 *   <li>little-endian classic TIFF, uncompressed, one row per strip, SampleFormat = IEEE float;</li>
 *   <li>ModelPixelScaleTag (Δλ, Δφ, 0) and ModelTiepointTag (0, 0, 0, west edge, north edge, 0): row 0 is the
 *       northernmost, pixels are areas (GTRasterTypeGeoKey = PixelIsArea);</li>
 *   <li>GeoKeyDirectoryTag: GTModelTypeGeoKey = 2 (geographic), GeographicTypeGeoKey = 4326,
 *       GeogAngularUnitsGeoKey = 9102 (degree);</li>
 *   <li>GDAL_NODATA (tag 42113, ASCII): NaN values are written as {@link #NODATA}.</li>
 * </ul>
 * Longitudes stay continuous (a grid crossing the antimeridian has a west edge below 180 and an east edge above).
 */
public final class GeoTiffWriter {
    private GeoTiffWriter() {}

    /** Value written for NaN, declared in GDAL_NODATA. */
    public static final float NODATA = -9999f;

    /** Writes the field atomically. */
    public static void write(Path target, ScalarField field) throws IOException {
        LonLatGrid g = field.grid();
        int w = g.nx(), h = g.ny();
        String noData = "-9999";
        String desc = field.name() + " (" + field.units() + "): " + field.longName();
        byte[] descBytes = (desc + "\0").getBytes(StandardCharsets.UTF_8);
        byte[] noDataBytes = (noData + "\0").getBytes(StandardCharsets.US_ASCII);
        short[] geoKeys = {
                1, 1, 0, 4,          // version 1.1.0, 4 keys
                1024, 0, 1, 2,       // GTModelTypeGeoKey = ModelTypeGeographic
                1025, 0, 1, 1,       // GTRasterTypeGeoKey = RasterPixelIsArea
                2048, 0, 1, 4326,    // GeographicTypeGeoKey = WGS 84
                2054, 0, 1, 9102,    // GeogAngularUnitsGeoKey = degree
        };
        double[] scale = {g.dLonDeg(), g.dLatDeg(), 0};
        double[] tie = {0, 0, 0, g.westDeg(), g.northDeg(), 0};
        final int nTags = 16;
        // layout: header(8) | IFD | extra data | strip offsets/counts | image
        int ifdSize = 2 + nTags * 12 + 4;
        int pos = 8 + ifdSize;
        int scaleOff = pos; pos += 24;
        int tieOff = pos; pos += 48;
        int geoOff = pos; pos += geoKeys.length * 2;
        int descOff = pos; pos += descBytes.length + (descBytes.length & 1);
        int noDataOff = pos; pos += noDataBytes.length + (noDataBytes.length & 1);
        int stripOffOff = pos; pos += 4 * h;
        int stripCntOff = pos; pos += 4 * h;
        int imageOff = pos;
        long rowBytes = 4L * w;
        long total = imageOff + rowBytes * h;
        if (total > 0xFFFFFFFFL) throw new IOException(target + ": raster too large for classic TIFF (" + total + " bytes)");
        AtomicWrite.write(target, out -> {
            ByteBuffer b = ByteBuffer.allocate(imageOff).order(ByteOrder.LITTLE_ENDIAN);
            b.put((byte) 'I').put((byte) 'I').putShort((short) 42).putInt(8);
            b.putShort((short) nTags);
            tag(b, 256, 4, 1, w);                 // ImageWidth
            tag(b, 257, 4, 1, h);                 // ImageLength
            tag(b, 258, 3, 1, 32);                // BitsPerSample
            tag(b, 259, 3, 1, 1);                 // Compression: none
            tag(b, 262, 3, 1, 1);                 // Photometric: BlackIsZero
            tag(b, 270, 2, descBytes.length, descOff); // ImageDescription
            tag(b, 273, 4, h, h == 1 ? imageOff : stripOffOff); // StripOffsets
            tag(b, 277, 3, 1, 1);                 // SamplesPerPixel
            tag(b, 278, 4, 1, 1);                 // RowsPerStrip
            tag(b, 279, 4, h, h == 1 ? (int) rowBytes : stripCntOff); // StripByteCounts
            tag(b, 284, 3, 1, 1);                 // PlanarConfiguration: chunky
            tag(b, 339, 3, 1, 3);                 // SampleFormat: IEEE float
            tag(b, 33550, 12, 3, scaleOff);       // ModelPixelScaleTag
            tag(b, 33922, 12, 6, tieOff);         // ModelTiepointTag
            tag(b, 34735, 3, geoKeys.length, geoOff); // GeoKeyDirectoryTag
            tag(b, 42113, 2, noDataBytes.length, noDataBytes.length <= 4 ? packAscii(noDataBytes) : noDataOff); // GDAL_NODATA
            b.putInt(0); // no next IFD
            for (double d : scale) b.putDouble(d);
            for (double d : tie) b.putDouble(d);
            for (short s : geoKeys) b.putShort(s);
            b.put(descBytes);
            if ((descBytes.length & 1) == 1) b.put((byte) 0);
            b.put(noDataBytes);
            if ((noDataBytes.length & 1) == 1) b.put((byte) 0);
            for (int r = 0; r < h; r++) b.putInt((int) (imageOff + r * rowBytes));
            for (int r = 0; r < h; r++) b.putInt((int) rowBytes);
            out.write(b.array(), 0, b.position());
            ByteBuffer row = ByteBuffer.allocate((int) rowBytes).order(ByteOrder.LITTLE_ENDIAN);
            double[] v = field.values();
            for (int r = 0; r < h; r++) {
                int j = h - 1 - r; // row 0 = north
                row.clear();
                for (int i = 0; i < w; i++) {
                    double x = v[j * w + i];
                    row.putFloat(Double.isNaN(x) ? NODATA : (float) x);
                }
                out.write(row.array(), 0, row.position());
            }
        });
    }

    private static int packAscii(byte[] s) {
        int v = 0;
        for (int i = 0; i < s.length; i++) v |= (s[i] & 0xff) << (8 * i);
        return v;
    }

    private static void tag(ByteBuffer b, int tag, int type, int count, int value) {
        b.putShort((short) tag).putShort((short) type).putInt(count);
        if (type == 3 && count == 1) b.putShort((short) value).putShort((short) 0);
        else b.putInt(value);
    }
}
