package org.gyreplan.gisdata.cf;

import java.util.Locale;

/**
 * CF calendars (CF Conventions 1.8, §4.4.1 "Calendar") and how each maps model dates to real instants.
 *
 * <ul>
 *   <li>{@link #STANDARD} (also "gregorian", the default): Julian calendar before 1582-10-15, Gregorian from then.</li>
 *   <li>{@link #PROLEPTIC_GREGORIAN}: Gregorian rules for all dates (as {@code java.time}).</li>
 *   <li>{@link #JULIAN}: Julian rules for all dates (a leap year every 4 years).</li>
 *   <li>{@link #NOLEAP} ("noleap", "365_day"): no leap years. A model date is mapped to the same calendar date
 *       (and time of day) in the proleptic Gregorian calendar; every noleap date exists there.</li>
 *   <li>{@link #ALL_LEAP} ("all_leap", "366_day") and {@link #DAY_360} ("360_day", 12 months of 30 days): a model
 *       date is mapped to the instant at the same fraction of the same (proleptic Gregorian) year, e.g. 360_day
 *       1990-07-01 00:00 (day 180 of 360) → 1990-07-02 12:00 (0.5 × 365 days into 1990). This keeps the
 *       order of steps and the seasons; it is a documented convention, not a real date.</li>
 * </ul>
 */
public enum CfCalendar {
    STANDARD, PROLEPTIC_GREGORIAN, JULIAN, NOLEAP, ALL_LEAP, DAY_360;

    /** The calendar named by a CF {@code calendar} attribute ({@code null} or blank → STANDARD). */
    public static CfCalendar parse(String name) {
        if (name == null || name.isBlank()) return STANDARD;
        return switch (name.trim().toLowerCase(Locale.ROOT)) {
            case "standard", "gregorian", "mixed" -> STANDARD;
            case "proleptic_gregorian" -> PROLEPTIC_GREGORIAN;
            case "julian" -> JULIAN;
            case "noleap", "365_day", "no_leap" -> NOLEAP;
            case "all_leap", "366_day" -> ALL_LEAP;
            case "360_day" -> DAY_360;
            default -> throw new IllegalArgumentException("unknown calendar '" + name + "'; expected one of standard, "
                    + "gregorian, proleptic_gregorian, julian, noleap, 365_day, all_leap, 366_day, 360_day");
        };
    }

    /** Whether dates of this calendar are real instants (not mapped by a convention). */
    public boolean isReal() {
        return this == STANDARD || this == PROLEPTIC_GREGORIAN || this == JULIAN;
    }

    /** CF name. */
    public String cfName() {
        return switch (this) {
            case STANDARD -> "standard";
            case PROLEPTIC_GREGORIAN -> "proleptic_gregorian";
            case JULIAN -> "julian";
            case NOLEAP -> "noleap";
            case ALL_LEAP -> "all_leap";
            case DAY_360 -> "360_day";
        };
    }
}
