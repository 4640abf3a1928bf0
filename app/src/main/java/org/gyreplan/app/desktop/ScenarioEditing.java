package org.gyreplan.app.desktop;

import org.gyreplan.app.desktop.study.MapStudy;

import java.nio.file.Path;

/** Reads a scenario's geometry for display before a run, and writes edits back to the scenario file. */
public interface ScenarioEditing {
    /** What can be shown before running (basin, sites, stations…), or null. */
    MapStudy preview(Path scenario) throws Exception;

    /** Writes the edited basin, exclusion zones, mooring sites and stations back to the scenario file. */
    void save(Path scenario, MapStudy edited) throws Exception;
}
