package org.gyreplan.app.cli;

import org.gyreplan.app.pipeline.StudyPipeline;
import org.gyreplan.solver.progress.ProgressListener;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.function.LongSupplier;

/**
 * Shows pipeline progress: a one-line bar with stage, percent and time left on a terminal; plain lines (one per
 * stage, and one per quarter of a long stage) when the output is a file or a pipe.
 */
final class ProgressPrinter implements ProgressListener {
    private final PrintWriter out;
    private final boolean bar;
    private final LongSupplier clockMillis;
    private final long start;
    private String lastStage = "";
    private int lastQuarter = -1;
    private int lastPercentShown = -1;
    private long lastDraw;

    ProgressPrinter(PrintWriter out, boolean bar, LongSupplier clockMillis) {
        this.out = out;
        this.bar = bar;
        this.clockMillis = clockMillis;
        this.start = clockMillis.getAsLong();
    }

    /** Overall fraction done from a stage and its own fraction. */
    static double overall(String stage, double fraction) {
        int k = StudyPipeline.STAGES.indexOf(stage);
        int n = StudyPipeline.STAGES.size();
        if (k < 0) return -1;
        return (k + Math.max(0, Math.min(1, fraction))) / n;
    }

    @Override
    public synchronized void progress(String stage, double fraction, String message) {
        if (bar) drawBar(stage, fraction, message);
        else printLine(stage, fraction, message);
    }

    private void printLine(String stage, double fraction, String message) {
        int quarter = fraction < 0 ? -1 : (int) Math.floor(Math.min(1, fraction) * 4);
        boolean newStage = !stage.equals(lastStage);
        if (!newStage && quarter == lastQuarter) return;
        if (!newStage && fraction < 1 && quarter <= lastQuarter) return;
        lastStage = stage;
        lastQuarter = quarter;
        String pct = fraction < 0 ? "" : String.format(Locale.ROOT, " %3d%%", (int) Math.floor(100 * Math.min(1, fraction)));
        out.println("[" + stage + "]" + pct + (message == null || message.isEmpty() ? "" : " " + message));
        out.flush();
    }

    private void drawBar(String stage, double fraction, String message) {
        long now = clockMillis.getAsLong();
        double all = overall(stage, fraction);
        int pct = all < 0 ? -1 : (int) Math.floor(100 * all);
        if (pct == lastPercentShown && stage.equals(lastStage) && now - lastDraw < 250) return;
        lastPercentShown = pct;
        lastStage = stage;
        lastDraw = now;
        int width = 28;
        int filled = all < 0 ? 0 : (int) Math.round(all * width);
        String eta = "";
        if (all > 0.02 && all < 1) {
            long left = (long) ((now - start) / all * (1 - all) / 1000);
            eta = String.format(Locale.ROOT, "  %d:%02d left", left / 60, left % 60);
        }
        String msg = message == null ? "" : message;
        if (msg.length() > 38) msg = msg.substring(0, 37) + "…";
        out.print(String.format(Locale.ROOT, "\r[%s%s] %3d%%  %-9s %-38s%s\u001b[K", "#".repeat(filled),
                ".".repeat(width - filled), Math.max(0, pct), stage, msg, eta));
        out.flush();
    }

    /** Ends the bar line (terminal mode). */
    synchronized void finish() {
        if (bar) {
            out.println();
            out.flush();
        }
    }
}
