/**
 * CSV: writing tables after RFC 4180 (UTF-8, units in the header as {@code name [unit]}) with
 * {@link org.gyreplan.gisdata.csv.CsvTable}, and reading station wind series with
 * {@link org.gyreplan.gisdata.csv.StationWindCsv} into eastward/northward components in m s⁻¹ (SI inside; knots,
 * km/h and mph converted on entry; meteorological "from" directions converted explicitly). Errors are
 * {@link org.gyreplan.gisdata.csv.CsvFormatException} naming the file, line and column.
 */
package org.gyreplan.gisdata.csv;
