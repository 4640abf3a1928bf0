package org.gyreplan.gisdata.netcdf;

/** External data types of netCDF variables and attributes, with their classic-format codes and sizes in bytes. */
public enum DataType {
    BYTE(1, 1), CHAR(2, 1), SHORT(3, 2), INT(4, 4), FLOAT(5, 4), DOUBLE(6, 8),
    UBYTE(7, 1), USHORT(8, 2), UINT(9, 4), INT64(10, 8), UINT64(11, 8), STRING(12, 0);

    private final int code;
    private final int size;

    DataType(int code, int size) {
        this.code = code;
        this.size = size;
    }

    /** The nc_type code of the classic format. */
    public int code() { return code; }
    /** Size of one value in bytes (0 for variable-length strings). */
    public int size() { return size; }
    /** Whether values are numbers (not text). */
    public boolean isNumeric() { return this != CHAR && this != STRING; }

    /** The type for a classic-format nc_type code, or {@code null} if unknown. */
    public static DataType ofCode(int code) {
        for (DataType t : values()) if (t.code == code) return t;
        return null;
    }

    /**
     * The default fill value the netCDF library uses for unwritten values of this type (netCDF User Guide,
     * "Fill Values"); NaN for types without one.
     */
    public double defaultFill() {
        return switch (this) {
            case BYTE -> -127;
            case SHORT -> -32767;
            case INT -> -2147483647;
            case FLOAT -> 9.9692099683868690e+36f;
            case DOUBLE -> 9.9692099683868690e+36;
            case UBYTE -> 255;
            case USHORT -> 65535;
            case UINT -> 4294967295.0;
            default -> Double.NaN;
        };
    }
}
