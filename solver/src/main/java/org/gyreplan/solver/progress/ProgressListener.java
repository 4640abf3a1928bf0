package org.gyreplan.solver.progress;

/**
 * Receives progress of long work. Implementations must be cheap and thread-safe; the GUI forwards to its
 * own thread, the CLI draws a bar.
 */
@FunctionalInterface
public interface ProgressListener {
    /**
     * @param stage    short name of the current stage, e.g. "gyre solve"
     * @param fraction completed fraction of the stage in [0, 1], or a negative value when unknown
     * @param message  optional detail, may be empty
     */
    void progress(String stage, double fraction, String message);

    /** A listener that ignores everything. */
    ProgressListener NONE = (s, f, m) -> { };
}
