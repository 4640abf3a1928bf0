package org.gyreplan.gisdata.vector;

import org.gyreplan.solver.plan.Cautions;

/** The caution carried by every export that may be taken to sea (GPX, KML, plan tables). */
public final class SeaCaution {
    private SeaCaution() {}

    /** One-paragraph caution text: the solver's standard planning cautions ({@link Cautions#STANDARD}) joined. */
    public static final String TEXT = String.join(" ", Cautions.STANDARD);
}
