package org.gyreplan.gisdata.vector;

/** The caution carried by every export that may be taken to sea (GPX, KML, plan tables). */
public final class SeaCaution {
    private SeaCaution() {}

    /** One-paragraph caution text. */
    public static final String TEXT = "Not for navigation. Positions are planning aids computed by Gyreplan; verify them"
            + " against official charts and notices to mariners. Permits and local regulations apply; the master and"
            + " licensed practice decide on deck operations.";
}
