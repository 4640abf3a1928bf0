package org.gyreplan.app.pipeline;

import org.gyreplan.app.scenario.Headline;
import org.gyreplan.app.scenario.Scenario;
import org.gyreplan.app.scenario.ScenarioFiles;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Every scenario in {@code scenarios/} runs end to end and meets its own {@code expected} block. The expected
 * values and their sources (numpy reference computations in make_scenario_data.py, published bounds, the design
 * of the synthetic winds) are written beside each entry in the scenario file. Each run streams 1–2 years of daily
 * winds and solves the gyre (about 15 s for all three); it runs in the default suite because the scenarios are the
 * product's end-to-end regression cases.
 */
class ScenariosTest {

    @ParameterizedTest
    @ValueSource(strings = {"demo", "southern-coast", "island-bay"})
    void scenarioMeetsItsExpectedBlock(String name) throws Exception {
        Path file = Path.of("..", "scenarios", name, "scenario.yaml");
        assertTrue(Files.isRegularFile(file), "missing " + file.toAbsolutePath());
        Scenario s = ScenarioFiles.load(file);
        assertFalse(s.expectedOrEmpty().isEmpty(), name + " has no expected block");
        Path out = Files.createTempDirectory("gyreplan-scenario-" + name);
        StudyResult r = new StudyPipeline().run(s, out, null, null);
        List<String> failures = new ArrayList<>();
        for (Map.Entry<String, Scenario.Expectation> e : s.expectedOrEmpty().entrySet()) {
            Headline h = Headline.byKey(e.getKey()).orElseThrow();
            Double got = r.headlines().get(h);
            if (got == null || !e.getValue().accepts(got)) {
                failures.add(e.getKey() + ": got " + got + ", expected " + e.getValue() + " (" + e.getValue().source + ")");
            }
        }
        assertTrue(failures.isEmpty(), name + ":\n" + String.join("\n", failures));
        assertTrue(r.report().isPresent() && Files.size(r.report().get()) > 10_000, "report written");
    }
}
