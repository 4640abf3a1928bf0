package org.gyreplan.solver.upwelling;

/** Quality flag of one index value. */
public enum IndexFlag {
    /** Computed normally. */
    OK,
    /** The point lies within the equatorial cut-off, where Ekman transport is undefined; the value is NaN. */
    EQUATORIAL_CUTOFF,
    /** No finite stress (or pressure) could be sampled for the point; the value is NaN. */
    NO_DATA,
    /** The nearest usable wind cell lies farther than the allowed distance; the value is NaN. */
    TOO_FAR_FROM_DATA,
    /** The gradient-wind correction has no real solution (anticyclonic curvature too strong); the value is NaN. */
    GRADIENT_WIND_INVALID,
    /** Computed, but over only part of the requested range (curl band partly over land or undefined). */
    PARTIAL
}
