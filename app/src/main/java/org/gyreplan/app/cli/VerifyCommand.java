package org.gyreplan.app.cli;

import org.gyreplan.app.pipeline.Verification;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

/**
 * {@code gyreplan verify}: runs the built-in verification cases (analytic solutions and published values) through
 * the solver and prints a table: case, source, expected, got, tolerance, pass.
 */
@Command(name = "verify", mixinStandardHelpOptions = true,
        description = {"Check the physics against analytic solutions and published values and print a table."},
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:every case passed", "4:at least one case failed"})
public final class VerifyCommand implements Callable<Integer> {

    @Option(names = "--only", paramLabel = "<prefix>", description = "run only cases whose id starts with this (e.g. ROT, EK)")
    String only;

    @CommandLine.Spec CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        List<Verification.Case> cases = Verification.cases().stream()
                .filter(c -> only == null || c.id().toUpperCase(Locale.ROOT).startsWith(only.toUpperCase(Locale.ROOT)))
                .toList();
        List<Verification.Outcome> results = cases.stream().map(Verification.Case::evaluate).toList();
        out.print(Verification.table(results));
        long failed = results.stream().filter(r -> !r.pass()).count();
        out.println();
        out.println(results.size() + " cases, " + (results.size() - failed) + " passed, " + failed + " failed");
        out.flush();
        return failed == 0 ? 0 : GyreplanCommand.EXIT_VERIFY_FAILED;
    }
}
