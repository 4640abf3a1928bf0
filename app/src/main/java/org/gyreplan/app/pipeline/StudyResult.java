package org.gyreplan.app.pipeline;

import org.gyreplan.app.scenario.Headline;
import org.gyreplan.app.scenario.Scenario;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;

import java.nio.file.Path;
import java.util.Collections;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Everything a run produced, for the report, the desktop app and tests. Immutable once returned by
 * {@link StudyPipeline#run}.
 *
 * <ul>
 *   <li>{@link #grid()}: the study grid with the basin's ocean mask;</li>
 *   <li>{@link #fields()}: named scalar fields (time means, persistence, streamfunction …), each with units;</li>
 *   <li>{@link #vectors()}: named vector fields (mean stress, mean Ekman transport);</li>
 *   <li>{@link #series()}: time series (coastal index per point …);</li>
 *   <li>{@link #headlines()}: the headline numbers a scenario's {@code expected} block checks;</li>
 *   <li>{@link #warnings()}, {@link #provenance()}, {@link #outputFiles()} (relative to {@link #outputDir()}).</li>
 * </ul>
 */
public final class StudyResult {
    private final Scenario scenario;
    private final Path outputDir;
    private final LonLatGrid grid;
    private final Map<String, ScalarField> fields;
    private final Map<String, VectorField> vectors;
    private final List<NamedSeries> series;
    private final Map<Headline, Double> headlines;
    private final List<RunWarning> warnings;
    private final List<Path> outputFiles;
    private final Map<String, Object> products;
    private final Provenance provenance;

    StudyResult(Scenario scenario, Path outputDir, LonLatGrid grid, Map<String, ScalarField> fields,
                Map<String, VectorField> vectors, List<NamedSeries> series, Map<Headline, Double> headlines,
                List<RunWarning> warnings, List<Path> outputFiles, Map<String, Object> products, Provenance provenance) {
        this.scenario = scenario;
        this.outputDir = outputDir;
        this.grid = grid;
        this.fields = Collections.unmodifiableMap(new LinkedHashMap<>(fields));
        this.vectors = Collections.unmodifiableMap(new LinkedHashMap<>(vectors));
        this.series = List.copyOf(series);
        this.headlines = Collections.unmodifiableMap(new EnumMap<>(headlines.isEmpty() ? new EnumMap<>(Headline.class) : headlines));
        this.warnings = List.copyOf(warnings);
        this.outputFiles = List.copyOf(outputFiles);
        this.products = Collections.unmodifiableMap(new LinkedHashMap<>(products));
        this.provenance = provenance;
    }

    public Scenario scenario() { return scenario; }
    /** Folder holding the outputs (absolute). */
    public Path outputDir() { return outputDir; }
    /** The study grid with the basin mask. */
    public LonLatGrid grid() { return grid; }
    public Map<String, ScalarField> fields() { return fields; }
    public Optional<ScalarField> field(String name) { return Optional.ofNullable(fields.get(name)); }
    public Map<String, VectorField> vectors() { return vectors; }
    public List<NamedSeries> series() { return series; }
    public Map<Headline, Double> headlines() { return headlines; }
    public Optional<Double> headline(Headline h) { return Optional.ofNullable(headlines.get(h)); }
    public List<RunWarning> warnings() { return warnings; }
    /** Files written, relative to {@link #outputDir()}. */
    public List<Path> outputFiles() { return outputFiles; }
    /** The HTML report, if one was written. */
    public Optional<Path> report() {
        return outputFiles.stream().filter(p -> p.getFileName().toString().equals("report.html"))
                .findFirst().map(outputDir::resolve);
    }
    /** Typed products of later stages (zones, mooring sites, survey plan …) by name. */
    public Map<String, Object> products() { return products; }
    public Provenance provenance() { return provenance; }
}
