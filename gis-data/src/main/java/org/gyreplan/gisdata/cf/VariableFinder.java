package org.gyreplan.gisdata.cf;

import org.gyreplan.gisdata.netcdf.NetcdfDataset;
import org.gyreplan.gisdata.netcdf.NetcdfFormatException;
import org.gyreplan.gisdata.netcdf.Variable;
import org.gyreplan.gisdata.units.UnitConversions;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Finds the file variable that plays a {@link VariableRole}, in this order:
 * <ol>
 *   <li>the explicit user mapping (an absent name is an error);</li>
 *   <li>a variable whose {@code standard_name} is one of the role's CF standard names;</li>
 *   <li>a variable whose name is one of the role's common names (case-insensitive) and whose units are a known
 *       unit of the role's quantity (or absent for the length roles);</li>
 *   <li>a variable whose {@code long_name} names the quantity (e.g. "zonal wind", "meridional wind",
 *       "sea level pressure") with units of the right quantity.</li>
 * </ol>
 * Only variables with at least two dimensions (a horizontal grid) are candidates. When nothing matches, the
 * error names the file and lists every variable it has with units and standard name.
 */
public final class VariableFinder {
    private VariableFinder() {}

    /** How a variable was chosen. */
    public enum Evidence { USER_MAPPING, STANDARD_NAME, COMMON_NAME, LONG_NAME }

    /** A found variable and why it was chosen. */
    public record Match(Variable variable, VariableRole role, Evidence evidence) { }

    /** The variable for a role, or {@code null} if none matches automatically and none is mapped. */
    public static Match find(NetcdfDataset nc, VariableRole role, VariableMapping mapping) throws NetcdfFormatException {
        String explicit = mapping == null ? null : mapping.get(role);
        if (explicit != null) {
            Variable v = nc.findVariable(explicit);
            if (v == null) {
                throw new NetcdfFormatException(nc.path(), "the " + role.description() + " was mapped to variable '"
                        + explicit + "', which the file does not have; the file has: " + listing(nc));
            }
            return new Match(v, role, Evidence.USER_MAPPING);
        }
        List<Variable> grids = new ArrayList<>();
        for (Variable v : nc.variables()) if (v.rank() >= 2 && v.dataType().isNumeric()) grids.add(v);
        for (String sn : role.standardNames()) {
            for (Variable v : grids) {
                String s = v.textAttribute("standard_name");
                if (s != null && s.trim().equalsIgnoreCase(sn)) return new Match(v, role, Evidence.STANDARD_NAME);
            }
        }
        for (String cn : role.commonNames()) {
            for (Variable v : grids) {
                if (v.name().equalsIgnoreCase(cn) && unitsFit(v, role) && !hasOtherStandardName(v, role)) {
                    return new Match(v, role, Evidence.COMMON_NAME);
                }
            }
        }
        for (Variable v : grids) {
            String ln = v.textAttribute("long_name");
            if (ln != null && longNameFits(ln.toLowerCase(Locale.ROOT), role) && unitsFit(v, role)
                    && !hasOtherStandardName(v, role)) {
                return new Match(v, role, Evidence.LONG_NAME);
            }
        }
        return null;
    }

    /** As {@link #find}, but a missing variable is an error that lists what the file has. */
    public static Match require(NetcdfDataset nc, VariableRole role, VariableMapping mapping) throws NetcdfFormatException {
        Match m = find(nc, role, mapping);
        if (m == null) {
            throw new NetcdfFormatException(nc.path(), "no " + role.description() + " variable found: expected "
                    + "standard_name " + String.join(" or ", role.standardNames()) + ", or a variable named one of "
                    + role.commonNames() + " with " + role.quantity().expected()
                    + "; map it explicitly if it has another name. The file has: " + listing(nc));
        }
        return m;
    }

    private static boolean hasOtherStandardName(Variable v, VariableRole role) {
        String s = v.textAttribute("standard_name");
        return s != null && !s.isBlank() && !role.standardNames().contains(s.trim());
    }

    private static boolean unitsFit(Variable v, VariableRole role) {
        String u = v.textAttribute("units");
        if (u == null || u.isBlank()) return role.quantity() == UnitConversions.Quantity.LENGTH;
        return UnitConversions.isKnown(role.quantity(), u);
    }

    private static boolean longNameFits(String ln, VariableRole role) {
        return switch (role) {
            case EASTWARD_WIND -> (ln.contains("zonal wind") || ln.contains("eastward wind") || ln.contains("u-wind")
                    || ln.contains("u wind") || ln.contains("u-component of wind")) && !ln.contains("stress");
            case NORTHWARD_WIND -> (ln.contains("meridional wind") || ln.contains("northward wind") || ln.contains("v-wind")
                    || ln.contains("v wind") || ln.contains("v-component of wind")) && !ln.contains("stress");
            case EASTWARD_STRESS -> (ln.contains("zonal") || ln.contains("eastward") || ln.contains("x")) && ln.contains("stress");
            case NORTHWARD_STRESS -> (ln.contains("meridional") || ln.contains("northward") || ln.contains("y")) && ln.contains("stress");
            case SEA_LEVEL_PRESSURE -> ln.contains("sea level pressure") || ln.contains("sea-level pressure")
                    || ln.contains("mean sea level pressure") || ln.contains("pressure reduced to msl");
            case SEA_FLOOR_DEPTH -> ln.contains("bathymetry") || ln.contains("sea floor depth") || ln.contains("water depth");
            case ALTITUDE -> ln.contains("relief") || ln.contains("elevation") || ln.contains("topography");
        };
    }

    /** One line per variable: name(dims) units, standard_name. */
    public static String listing(NetcdfDataset nc) {
        List<String> parts = new ArrayList<>();
        for (Variable v : nc.variables()) {
            StringBuilder b = new StringBuilder(v.name()).append(v.dimensionNames());
            String u = v.textAttribute("units");
            if (u != null) b.append(" units='").append(u).append('\'');
            String sn = v.textAttribute("standard_name");
            if (sn != null) b.append(" standard_name='").append(sn).append('\'');
            String ln = v.textAttribute("long_name");
            if (ln != null) b.append(" long_name='").append(ln).append('\'');
            parts.add(b.toString());
        }
        return parts.isEmpty() ? "(no variables)" : String.join("; ", parts);
    }
}
