package org.gyreplan.solver.upwelling;

/** How a stress (or wind) field is sampled at a coast point. */
public enum StressSampling {
    /**
     * The value of the nearest cell (great-circle distance between the point and cell centres) that is ocean in the
     * grid mask and whose stress is finite. Robust next to coasts where the grid's first ocean cell lies offshore.
     */
    NEAREST_OCEAN,
    /**
     * Bilinear interpolation between the four surrounding cell centres, using ocean cells (grid mask) with finite
     * values only, the weights renormalised; NaN if none of the four is finite.
     */
    BILINEAR
}
