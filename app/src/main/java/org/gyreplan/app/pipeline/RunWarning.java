package org.gyreplan.app.pipeline;

/**
 * A warning raised during a run and shown in the report and on the command line.
 *
 * @param kind   what sort of warning (stable key for tests and filters)
 * @param message readable text with numbers and units
 */
public record RunWarning(Kind kind, String message) {
    public enum Kind {
        /** Boundary layer narrower than three grid cells. */
        RESOLUTION,
        /** Cells inside the equatorial cut-off, where Ekman quantities are undefined. */
        EQUATORIAL,
        /** Missing values or gaps in the wind record. */
        DATA_GAP,
        /** Winds outside the validity range of the drag law. */
        DRAG_RANGE,
        /** Islands or other geometry the gyre solver reports. */
        GEOMETRY,
        /** A product could not be made (reason given). */
        PRODUCT,
        /** Anything else. */
        OTHER
    }

    @Override
    public String toString() { return kind.name().toLowerCase().replace('_', ' ') + ": " + message; }
}
