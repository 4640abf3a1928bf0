package org.gyreplan.app.scenario;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * Headline numbers of a run: the quantities a scenario's {@code expected} block may check and the report's
 * summary lists. Each has a key (as written in YAML) and a unit.
 */
public enum Headline {
    OCEAN_CELLS("oceanCells", "1", "ocean cells of the study grid inside the basin"),
    TIME_STEPS("timeSteps", "1", "wind time steps used"),
    MEAN_WIND_SPEED("meanWindSpeed", "m s-1", "basin- and time-mean wind speed at 10 m"),
    MEAN_EASTWARD_STRESS("meanEastwardStress", "Pa", "basin mean of the time-mean eastward wind stress"),
    MEAN_NORTHWARD_STRESS("meanNorthwardStress", "Pa", "basin mean of the time-mean northward wind stress"),
    MAX_MEAN_STRESS("maxMeanStress", "Pa", "largest magnitude of the time-mean wind stress"),
    MEAN_EKMAN_PUMPING("meanEkmanPumping", "m s-1", "basin mean of the time-mean Ekman pumping (positive upward)"),
    MAX_EKMAN_PUMPING("maxEkmanPumping", "m s-1", "largest time-mean Ekman pumping (upwelling)"),
    MIN_EKMAN_PUMPING("minEkmanPumping", "m s-1", "most negative time-mean Ekman pumping (downwelling)"),
    EQUATORIAL_CELLS("equatorialCells", "1", "ocean cells inside the equatorial cut-off"),
    MAX_STREAMFUNCTION("maxStreamfunctionSv", "Sv", "largest depth-integrated streamfunction"),
    MAX_SVERDRUP("maxSverdrupSv", "Sv", "largest Sverdrup streamfunction (interior balance, zero on the eastern coast)"),
    MIN_STREAMFUNCTION("minStreamfunctionSv", "Sv", "smallest depth-integrated streamfunction"),
    WESTERN_BOUNDARY_TRANSPORT("westernBoundaryTransportSv", "Sv", "largest western-boundary-current transport"),
    MEAN_COASTAL_INDEX("meanCoastalIndex", "m3 s-1 per 100 m", "mean coastal upwelling index over all index points and days"),
    PEAK_INDEX_MONTH("peakIndexMonth", "month", "calendar month of the largest climatological coastal index"),
    SPRING_TRANSITION_DAY("springTransitionDay", "day of year", "mean day of the spring transition (minimum of the cumulative index)"),
    MOORING_COUNT("mooringCount", "1", "moorings sited"),
    SURVEY_DURATION("surveyDurationHours", "h", "planned survey duration including weather allowance");

    private final String key;
    private final String units;
    private final String description;

    Headline(String key, String units, String description) {
        this.key = key;
        this.units = units;
        this.description = description;
    }

    /** The name used in scenario files and reports. */
    public String key() { return key; }
    /** Unit (UDUNITS-like spelling). */
    public String units() { return units; }
    public String description() { return description; }

    public static Optional<Headline> byKey(String key) {
        return Arrays.stream(values()).filter(h -> h.key.equals(key)).findFirst();
    }

    public static List<String> keys() {
        return Arrays.stream(values()).map(Headline::key).toList();
    }
}
