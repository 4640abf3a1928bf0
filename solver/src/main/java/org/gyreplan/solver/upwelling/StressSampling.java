package org.gyreplan.solver.upwelling;

/** How a stress (or wind) field is sampled at a coast point. */
public enum StressSampling {
    /**
     * The value of the nearest cell (great-circle distance between the point and cell centres) whose stress is
     * finite. Robust next to coasts where the grid's first ocean cell lies offshore.
     */
    NEAREST_OCEAN,
    /**
     * Bilinear interpolation between the four surrounding cell centres, using finite (ocean) cells only with the
     * weights renormalised; NaN if none of the four is finite.
     */
    BILINEAR
}
