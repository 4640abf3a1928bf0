package org.gyreplan.gisdata.cf;

import org.gyreplan.gisdata.units.UnitConversions.Quantity;

import java.util.List;

/**
 * The physical variables Gyreplan reads from gridded files, each with the CF standard names that identify it
 * (CF Standard Name Table), common variable names of widely used products (matched case-insensitively), and
 * the physical quantity of its units.
 */
public enum VariableRole {
    /** Eastward wind near the surface, m s⁻¹ (toward the east is positive). */
    EASTWARD_WIND("eastward wind", Quantity.SPEED,
            List.of("eastward_wind", "x_wind"),
            List.of("u10", "u10m", "uwnd", "uas", "u", "u_wind", "uwind", "wind_u", "eastward_wind", "u_10m", "ugrd10m", "ugrd")),
    /** Northward wind near the surface, m s⁻¹ (toward the north is positive). */
    NORTHWARD_WIND("northward wind", Quantity.SPEED,
            List.of("northward_wind", "y_wind"),
            List.of("v10", "v10m", "vwnd", "vas", "v", "v_wind", "vwind", "wind_v", "northward_wind", "v_10m", "vgrd10m", "vgrd")),
    /** Eastward surface stress on the ocean, Pa (downward flux of eastward momentum). */
    EASTWARD_STRESS("eastward surface stress", Quantity.STRESS,
            List.of("surface_downward_eastward_stress", "surface_downward_x_stress"),
            List.of("taux", "tau_x", "tauu", "ustr", "ustress", "tx", "iews", "sustr", "tau_east")),
    /** Northward surface stress on the ocean, Pa. */
    NORTHWARD_STRESS("northward surface stress", Quantity.STRESS,
            List.of("surface_downward_northward_stress", "surface_downward_y_stress"),
            List.of("tauy", "tau_y", "tauv", "vstr", "vstress", "ty", "inss", "svstr", "tau_north")),
    /** Air pressure reduced to mean sea level, Pa. */
    SEA_LEVEL_PRESSURE("sea-level pressure", Quantity.PRESSURE,
            List.of("air_pressure_at_mean_sea_level", "air_pressure_at_sea_level"),
            List.of("msl", "slp", "prmsl", "psl", "mslp", "pmsl", "msl_pressure", "slp_mb")),
    /** Depth of the sea floor below the geoid (positive down), m. */
    SEA_FLOOR_DEPTH("sea-floor depth (positive down)", Quantity.LENGTH,
            List.of("sea_floor_depth_below_geoid", "sea_floor_depth_below_sea_surface",
                    "sea_floor_depth_below_mean_sea_level", "sea_floor_depth"),
            List.of("depth", "bathymetry", "bathy", "h", "deptho", "elevation_below_sea_level")),
    /** Height of the surface above the geoid/mean sea level (positive up; negative at sea), m. */
    ALTITUDE("surface altitude (positive up)", Quantity.LENGTH,
            List.of("altitude", "surface_altitude", "height_above_mean_sea_level", "height_above_geoid",
                    "bedrock_altitude", "height_above_reference_ellipsoid"),
            List.of("rose", "elevation", "elev", "topo", "topography", "z", "height", "altitude", "etopo", "band1"));

    private final String description;
    private final Quantity quantity;
    private final List<String> standardNames;
    private final List<String> commonNames;

    VariableRole(String description, Quantity quantity, List<String> standardNames, List<String> commonNames) {
        this.description = description;
        this.quantity = quantity;
        this.standardNames = standardNames;
        this.commonNames = commonNames;
    }

    /** Human description, e.g. "eastward wind". */
    public String description() { return description; }
    /** Physical quantity of the values (decides the units accepted). */
    public Quantity quantity() { return quantity; }
    /** CF standard names that identify this role, preferred first. */
    public List<String> standardNames() { return standardNames; }
    /** Common variable names (lower case) that identify this role when no standard name is present. */
    public List<String> commonNames() { return commonNames; }
    /** The preferred CF standard name (first of {@link #standardNames()}). */
    public String standardName() { return standardNames.get(0); }
}
