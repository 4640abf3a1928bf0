package org.gyreplan.app.desktop;

import org.gyreplan.app.desktop.study.MapStudy;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;

import java.nio.file.Path;

/**
 * Runs a study for the desktop: reads the scenario, computes, writes outputs to {@code outDir}, and returns what
 * the map shows. Called off the FX thread; must poll the cancel token and report progress.
 */
@FunctionalInterface
public interface StudyRunner {
    MapStudy run(Path scenario, Path outDir, ProgressListener progress, CancelToken cancel) throws Exception;
}
