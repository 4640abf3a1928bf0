package org.gyreplan.app.cli;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import picocli.CommandLine;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;

import static org.junit.jupiter.api.Assertions.*;

/** Golden-output tests of every subcommand, exit statuses and one-line error reasons. */
class CliGoldenTest {
    @TempDir Path dir;

    record Run(int code, String out, String err) {}

    static Run exec(String... args) {
        CommandLine cl = GyreplanCommand.commandLine();
        StringWriter out = new StringWriter(), err = new StringWriter();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        cl.setUsageHelpWidth(100);
        int code = cl.execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "run", "inspect", "verify", "desktop"})
    void helpOfEachCommand(String sub) throws IOException {
        Run r = sub.isEmpty() ? exec("--help") : exec(sub, "--help");
        assertEquals(0, r.code(), r.err());
        Golden.check("help-" + (sub.isEmpty() ? "gyreplan" : sub), r.out());
    }

    @Test
    void verifyRotationTable() throws IOException {
        Run r = exec("verify", "--only", "ROT");
        assertEquals(0, r.code(), r.out() + r.err());
        Golden.check("verify-rot", r.out());
    }

    @Test
    void verifyAllCasesPass() throws IOException {
        Run r = exec("verify");
        assertEquals(0, r.code(), r.out() + r.err());
        Golden.check("verify-all", r.out());
    }

    @Test
    void inspectNetcdfFile() throws IOException {
        Run r = exec("inspect", org.gyreplan.app.pipeline.TestScenarios.demoWinds().toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("u10") && r.out().contains("v10"), r.out());
        Golden.check("inspect-netcdf", r.out().replace(org.gyreplan.app.pipeline.TestScenarios.demoWinds().toString(), "<winds>"));
    }

    @Test
    void inspectScenario() throws IOException {
        Path s = scenario();
        Run r = exec("inspect", s.toString());
        assertEquals(0, r.code(), r.err());
        Golden.check("inspect-scenario", r.out().replace(dir.toString(), "<dir>").replace(org.gyreplan.app.pipeline.TestScenarios.demoWinds().toString(), "<winds>"));
    }

    @Test
    void runPrintsPlainProgressAndReportLocation() throws IOException {
        Path s = scenario();
        Path out = dir.resolve("out");
        Run r = exec("run", s.toString(), "--out", out.toString(), "--progress", "lines");
        assertEquals(0, r.code(), r.err());
        assertTrue(Files.isRegularFile(out.resolve("report.html")));
        Golden.check("run-lines", r.out().replace(dir.toString(), "<dir>").replace(org.gyreplan.app.pipeline.TestScenarios.demoWinds().toString(), "<winds>"));
    }

    @Test
    void invalidScenarioGivesExit3WithFileAndLine() throws IOException {
        Path s = scenario();
        Files.writeString(s, Files.readString(s).replace("depth: 1000", "depth: -5"));
        Run r = exec("run", s.toString(), "--out", dir.resolve("o").toString());
        assertEquals(GyreplanCommand.EXIT_INPUT, r.code());
        assertTrue(r.err().contains(s + ":11:"), r.err());
        assertTrue(r.err().contains("gyre.depth: must be > 0"), r.err());
        assertFalse(Files.exists(dir.resolve("o")), "nothing may be written for an invalid scenario");
    }

    @Test
    void missingArgumentIsAUsageError() {
        Run r = exec("run");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("Missing required"), r.err());
    }

    @Test
    void inspectMissingFileIsOneLine() {
        Run r = exec("inspect", dir.resolve("none.nc").toString());
        assertEquals(GyreplanCommand.EXIT_INPUT, r.code());
        assertEquals(1, r.err().strip().lines().count(), r.err());
    }

    @Test
    void desktopWithoutTheAppSaysSoInOneLine() {
        CommandLine cl = GyreplanCommand.commandLine();
        StringWriter err = new StringWriter();
        cl.setErr(new PrintWriter(err, true));
        DesktopCommand d = cl.getSubcommands().get("desktop").getCommand();
        d.launcherName = "org.gyreplan.app.desktop.NoSuchLauncher";
        int code = cl.execute("desktop");
        assertEquals(1, code);
        assertTrue(err.toString().contains("not available"), err.toString());
        assertEquals(1, err.toString().strip().lines().count());
    }

    private Path scenario() throws IOException {
        return org.gyreplan.app.pipeline.TestScenarios.small(dir, "Golden test study", "report", "");
    }

    static String quote(String s) { return Matcher.quoteReplacement(s); }
}
