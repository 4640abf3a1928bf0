/**
 * Unit strings of input files converted to SI at the edge: speeds to m s⁻¹, pressures and stresses to Pa,
 * lengths and depths to m. The spellings accepted are those of UDUNITS and common practice in data files
 * (e.g. "m/s", "M/S", "m s-1", "knots", "hPa", "mbar", "MB", "N/m2", "dyn/cm2", "meters"). An unknown unit is an
 * error, never a silent assumption.
 */
package org.gyreplan.gisdata.units;
