package org.gyreplan.solver.stress;

import java.util.List;
import java.util.Locale;

/**
 * The catalogue of drag laws and their stable identifiers (used in scenarios and reports).
 *
 * <table>
 *   <caption>Identifiers</caption>
 *   <tr><td>{@code large-pond-1981}</td><td>{@link LargePond1981}</td></tr>
 *   <tr><td>{@code trenberth-1990}</td><td>{@link TrenberthLargeOlson1990}</td></tr>
 *   <tr><td>{@code large-yeager-2004}</td><td>{@link LargeYeager2004}</td></tr>
 *   <tr><td>{@code large-yeager-2009}</td><td>{@link LargeYeager2009}</td></tr>
 *   <tr><td>{@code smith-1980}</td><td>{@link Smith1980}</td></tr>
 *   <tr><td>{@code yelland-taylor-1996}</td><td>{@link YellandTaylor1996}</td></tr>
 *   <tr><td>{@code vera-1983}</td><td>{@link Vera1983}</td></tr>
 *   <tr><td>{@code garratt-1977}</td><td>{@link Garratt1977}</td></tr>
 *   <tr><td>{@code constant:<value>}</td><td>{@link ConstantDrag}, e.g. {@code constant:0.0013}</td></tr>
 * </table>
 */
public final class DragLaws {
    private DragLaws() {}

    /** Every speed-dependent law, in a fixed order. */
    public static List<DragLaw> speedDependent() {
        return List.of(LargePond1981.INSTANCE, TrenberthLargeOlson1990.INSTANCE, LargeYeager2004.INSTANCE,
                LargeYeager2009.INSTANCE, Smith1980.INSTANCE, YellandTaylor1996.INSTANCE, Vera1983.INSTANCE,
                Garratt1977.INSTANCE);
    }

    /** A constant drag coefficient (dimensionless). */
    public static DragLaw constant(double value) {
        return new ConstantDrag(value);
    }

    /**
     * The law with the given identifier (case-insensitive, surrounding blanks ignored).
     *
     * @throws IllegalArgumentException naming the identifier and the accepted ones if it is unknown
     */
    public static DragLaw byName(String id) {
        if (id == null) throw new IllegalArgumentException("drag law: expected an identifier, got null");
        String key = id.trim().toLowerCase(Locale.ROOT);
        if (key.startsWith("constant:")) {
            String number = key.substring("constant:".length()).trim();
            double value;
            try {
                value = Double.parseDouble(number);
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("drag law '" + id + "': expected constant:<number>, e.g. constant:0.0013");
            }
            return constant(value);
        }
        for (DragLaw law : speedDependent()) {
            if (law.id().equals(key)) return law;
        }
        StringBuilder known = new StringBuilder();
        for (DragLaw law : speedDependent()) known.append(law.id()).append(", ");
        known.append("constant:<value>");
        throw new IllegalArgumentException("unknown drag law '" + id + "'; expected one of: " + known);
    }
}
