package org.gyreplan.gisdata.netcdf;

import java.io.IOException;
import java.nio.file.Path;

/** A file is not a readable netCDF file (wrong magic bytes, truncated, or an unsupported feature). */
public class NetcdfFormatException extends IOException {
    private final Path file;

    public NetcdfFormatException(Path file, String message) {
        super(file + ": " + message);
        this.file = file;
    }

    public NetcdfFormatException(Path file, String message, Throwable cause) {
        super(file + ": " + message, cause);
        this.file = file;
    }

    /** The file concerned. */
    public Path file() { return file; }
}
