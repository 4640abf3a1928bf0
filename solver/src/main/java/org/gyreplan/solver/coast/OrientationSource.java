package org.gyreplan.solver.coast;

/** Where the orientation (coast and offshore bearings) of a {@link CoastPoint} comes from. */
public enum OrientationSource {
    /** Chord of the coastline over the smoothing length, see {@link Coastline}. */
    SMOOTHED,
    /** Given by the user (overrides the smoothed value). */
    USER
}
