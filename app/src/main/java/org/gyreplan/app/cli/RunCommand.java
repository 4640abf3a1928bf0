package org.gyreplan.app.cli;

import org.gyreplan.app.pipeline.RunWarning;
import org.gyreplan.app.pipeline.StudyException;
import org.gyreplan.app.pipeline.StudyPipeline;
import org.gyreplan.app.pipeline.StudyResult;
import org.gyreplan.app.scenario.Scenario;
import org.gyreplan.app.scenario.ScenarioException;
import org.gyreplan.app.scenario.ScenarioFiles;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.CancelledException;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;

/** {@code gyreplan run <scenario> --out <dir>}: runs a study and prints where the report is. */
@Command(name = "run", mixinStandardHelpOptions = true,
        description = {"Run the study described by a scenario file and write its outputs and report.",
                "Progress is shown as a bar on a terminal and as plain lines otherwise; Ctrl-C stops cleanly",
                "and leaves no partial files."},
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:the study ran; outputs and report written",
                "1:an unexpected error (one-line reason printed)",
                "2:wrong command-line usage",
                "3:the scenario or an input file cannot be used (file, line and reason printed)",
                "130:cancelled (Ctrl-C); no outputs left behind"})
public final class RunCommand implements Callable<Integer> {

    public enum ProgressMode { auto, bar, lines, none }

    @Parameters(index = "0", paramLabel = "<scenario>", description = "scenario file (YAML)")
    Path scenarioFile;

    @Option(names = {"-o", "--out"}, required = true, paramLabel = "<dir>",
            description = "folder for the outputs (created if missing; files of the same names are replaced)")
    Path outDir;

    @Option(names = "--progress", paramLabel = "<mode>", defaultValue = "auto",
            description = "progress display: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}: a bar on a terminal, lines otherwise)")
    ProgressMode progressMode;

    @CommandLine.Spec CommandLine.Model.CommandSpec spec;

    /** For tests: the token the shutdown hook cancels. */
    final CancelToken cancel = new CancelToken();

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Scenario scenario;
        try {
            scenario = ScenarioFiles.load(scenarioFile);
        } catch (ScenarioException e) {
            err.println("gyreplan: the scenario cannot be used:");
            e.problems().forEach(p -> err.println("  " + p));
            err.flush();
            return GyreplanCommand.EXIT_INPUT;
        }
        boolean bar = switch (progressMode) {
            case bar -> true;
            case auto -> System.console() != null;
            default -> false;
        };
        ProgressPrinter printer = progressMode == ProgressMode.none ? null
                : new ProgressPrinter(out, bar, System::currentTimeMillis);
        out.println("Study: " + scenario.study.name);
        out.flush();

        CountDownLatch finished = new CountDownLatch(1);
        Thread hook = new Thread(() -> {
            cancel.cancel();
            try {
                finished.await(20, TimeUnit.SECONDS);
            } catch (InterruptedException ignored) {
                Thread.currentThread().interrupt();
            }
        }, "gyreplan-cancel-on-exit");
        boolean hooked = registerHook(hook);
        try {
            StudyResult r = new StudyPipeline().run(scenario, outDir,
                    printer == null ? (s, f, m) -> { } : printer, cancel);
            if (printer != null) printer.finish();
            for (RunWarning w : r.warnings()) out.println("warning: " + w);
            out.println("Wrote " + r.outputFiles().size() + " files to " + r.outputDir());
            r.report().ifPresent(p -> out.println("Report: " + p));
            out.flush();
            return 0;
        } catch (CancelledException e) {
            if (printer != null) printer.finish();
            err.println("gyreplan: cancelled; no outputs were written");
            err.flush();
            return GyreplanCommand.EXIT_CANCELLED;
        } catch (StudyException e) {
            if (printer != null) printer.finish();
            err.println("gyreplan: " + GyreplanCommand.oneLine(e));
            err.flush();
            return GyreplanCommand.EXIT_INPUT;
        } catch (Exception e) {
            if (printer != null) printer.finish();
            if (cancel.isCancelled()) {
                // interrupted by Ctrl-C while the JVM shuts down: the staged outputs were discarded
                err.println("gyreplan: cancelled; no outputs were written");
                err.flush();
                return GyreplanCommand.EXIT_CANCELLED;
            }
            err.println("gyreplan: run failed: " + GyreplanCommand.oneLine(e));
            err.flush();
            return 1;
        } finally {
            finished.countDown();
            if (hooked) {
                try {
                    Runtime.getRuntime().removeShutdownHook(hook);
                } catch (IllegalStateException ignored) {
                    // the JVM is already shutting down: the hook is running and waits for us
                }
            }
        }
    }

    private static boolean registerHook(Thread hook) {
        try {
            Runtime.getRuntime().addShutdownHook(hook);
            return true;
        } catch (IllegalStateException e) {
            return false;
        }
    }
}
