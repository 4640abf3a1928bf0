package org.gyreplan.app.desktop;

import javafx.application.Platform;
import javafx.concurrent.Task;
import javafx.embed.swing.SwingFXUtils;
import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.geometry.Pos;
import javafx.scene.control.Alert;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.Separator;
import javafx.scene.control.SplitPane;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.control.ToolBar;
import javafx.scene.control.Tooltip;
import javafx.scene.image.WritableImage;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.stage.Window;
import org.gyreplan.app.desktop.map.MapCanvas;
import org.gyreplan.app.desktop.map.MapLayer;
import org.gyreplan.app.desktop.map.MapPoint;
import org.gyreplan.app.desktop.map.MapProjection;
import org.gyreplan.app.desktop.map.PolygonLayer;
import org.gyreplan.app.desktop.study.CruisePlan;
import org.gyreplan.app.desktop.study.MapStudy;
import org.gyreplan.app.desktop.study.StudyLayers;
import org.gyreplan.app.desktop.ui.ChartPane;
import org.gyreplan.app.desktop.ui.InspectorPanel;
import org.gyreplan.app.desktop.ui.LayerPanel;
import org.gyreplan.app.desktop.ui.PlanPanel;
import org.gyreplan.app.desktop.ui.TimeBar;
import org.gyreplan.gisdata.io.AtomicWrite;
import org.gyreplan.gisdata.vector.PolygonFeature;
import org.gyreplan.gisdata.vector.PolygonFiles;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.CancelledException;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;

import javax.imageio.ImageIO;
import java.io.File;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

/**
 * The main window: menu and tool bar on top, layers on the left, the map with its time bar in the centre and the
 * point charts below it, point values, plan and messages on the right, progress and status at the bottom.
 * All long work runs in a background {@link Task}; the FX thread never waits on it.
 */
public class MainWindow extends BorderPane {
    /** What a finished drawing becomes. */
    public enum DrawTarget { BASIN, EXCLUSION }

    private final MapCanvas map = new MapCanvas();
    private final LayerPanel layerPanel = new LayerPanel(map);
    private final InspectorPanel inspector = new InspectorPanel();
    private final ChartPane charts = new ChartPane();
    private final TimeBar timeBar = new TimeBar(map.timeStepProperty());
    private final PlanPanel plan = new PlanPanel();
    private final ListView<String> messages = new ListView<>();
    private final ProgressBar progress = new ProgressBar(0);
    private final Label status = new Label("Ready");
    private final Label cursor = new Label();
    private final Button runButton = new Button("Run study");
    private final Button cancelButton = new Button("Cancel");
    private final CheckBox followCursor = new CheckBox("Follow cursor");
    private final TabPane rightTabs = new TabPane();
    private final SplitPane centreSplit = new SplitPane();
    private final ToggleGroup tools = new ToggleGroup();

    private final StudyRunner runner;
    private final ScenarioEditing scenarioFiles;
    private Path scenario;
    private MapStudy study;
    private StudyLayers.Built built;
    private Task<MapStudy> task;
    private CancelToken cancelToken;
    private DrawTarget drawTarget = DrawTarget.BASIN;
    private boolean dialogs = true;
    private volatile boolean running;
    private double[] pinned;
    private double[] hoverAt;
    private boolean movedPoints;
    private Consumer<String> titleSink = t -> { };

    /**
     * @param runner        computes a study (off the FX thread)
     * @param scenarioFiles reads and saves scenario geometry, or null if unavailable
     * @param scenario      scenario file, or null
     */
    public MainWindow(StudyRunner runner, ScenarioEditing scenarioFiles, Path scenario) {
        this.runner = runner;
        this.scenarioFiles = scenarioFiles;
        this.scenario = scenario;
        getStyleClass().add("gyreplan-main");
        getStylesheets().add(MainWindow.class.getResource("gyreplan.css").toExternalForm());
        map.setId("map");
        setTop(new VBox(menuBar(), toolBar()));

        VBox mapBox = new VBox(map, timeBar);
        VBox.setVgrow(map, Priority.ALWAYS);
        centreSplit.setOrientation(Orientation.VERTICAL);
        centreSplit.getItems().addAll(mapBox, charts);
        centreSplit.setDividerPositions(0.74);
        SplitPane.setResizableWithParent(charts, false);

        followCursor.setSelected(true);
        followCursor.setId("followCursor");
        VBox inspect = new VBox(4, followCursor, inspector);
        inspect.setPadding(new Insets(6, 0, 0, 8));
        VBox.setVgrow(inspector, Priority.ALWAYS);
        messages.setId("messages");
        messages.setPlaceholder(new Label("No messages"));
        Tab tValues = new Tab("Point values", inspect);
        Tab tPlan = new Tab("Plan", plan);
        Tab tMsg = new Tab("Messages", messages);
        tValues.setId("tabValues");
        tPlan.setId("tabPlan");
        tMsg.setId("tabMessages");
        rightTabs.getTabs().addAll(tValues, tPlan, tMsg);
        rightTabs.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        rightTabs.setPrefWidth(420);
        rightTabs.setMinWidth(240);

        SplitPane main = new SplitPane(layerPanel, centreSplit, rightTabs);
        main.setDividerPositions(0.16, 0.71);
        SplitPane.setResizableWithParent(layerPanel, false);
        SplitPane.setResizableWithParent(rightTabs, false);
        setCenter(main);
        setBottom(statusBar());

        map.setOnHover(this::hover);
        map.setOnMapClicked((lon, lat) -> {
            pinned = new double[] {lon, lat};
            followCursor.setSelected(false);
            refreshInspector();
        });
        map.setOnPointClicked(this::pointClicked);
        map.setOnPolygonDrawn(this::polygonDrawn);
        map.timeStepProperty().addListener((o, a, b) -> {
            charts.setTimeStep(b.intValue());
            refreshInspector();
        });
        followCursor.selectedProperty().addListener((o, a, b) -> { if (b) pinned = null; });
        setStudy(new MapStudy());
    }

    // ---- accessors used by the application and tests ----
    public MapCanvas map() { return map; }
    public LayerPanel layerPanel() { return layerPanel; }
    public InspectorPanel inspector() { return inspector; }
    public ChartPane charts() { return charts; }
    public TimeBar timeBar() { return timeBar; }
    public PlanPanel plan() { return plan; }
    public MapStudy study() { return study; }
    public StudyLayers.Built layers() { return built; }
    public ListView<String> messages() { return messages; }
    public String statusText() { return status.getText(); }
    public Path scenario() { return scenario; }
    /** Whether errors also open a dialog (tests turn this off). */
    public void setDialogs(boolean on) { dialogs = on; }
    public void setTitleSink(Consumer<String> sink) { titleSink = sink; titleSink.accept(windowTitle()); }
    public void setDrawTarget(DrawTarget t) { drawTarget = t; }

    /** Shows a study: rebuilds layers, time bar, plan and messages, and fits the map. */
    public void setStudy(MapStudy s) {
        study = s;
        movedPoints = false;
        built = StudyLayers.build(s);
        map.layers().setAll(built.layers());
        built.moorings().addMoveListener(p -> pointMoved("Mooring site", p));
        built.stations().addMoveListener(p -> pointMoved("Station", p));
        timeBar.setSteps(s.stepLabels);
        charts.setStepTimes(s.stepTimes.size() == s.stepLabels.size() && !s.stepTimes.isEmpty() ? s.stepTimes::get : null);
        showPlan();
        messages.getItems().setAll(s.warnings);
        rightTabs.getTabs().get(2).setText(s.warnings.isEmpty() ? "Messages" : "Messages (" + s.warnings.size() + ")");
        double[] ext = s.extent != null ? s.extent : extentOf(s);
        map.fit(ext[0], ext[1], ext[2], ext[3]);
        layerPanel.refresh();
        titleSink.accept(windowTitle());
    }

    private String windowTitle() {
        return "Gyreplan — " + (study == null ? "" : study.title) + (scenario == null ? "" : " — " + scenario.getFileName());
    }

    static double[] extentOf(MapStudy s) {
        Envelope e = new Envelope();
        if (s.basin != null) e.expandToInclude(s.basin.getEnvelopeInternal());
        for (MapStudy.Scalar sc : s.scalars) {
            var g = sc.frames().get(0).grid();
            e.expandToInclude(new Envelope(g.westDeg(), g.eastDeg(), g.southDeg(), g.northDeg()));
        }
        if (s.depth != null && e.isNull()) {
            var g = s.depth.grid();
            e.expandToInclude(new Envelope(g.westDeg(), g.eastDeg(), g.southDeg(), g.northDeg()));
        }
        for (MapPoint p : s.moorings) e.expandToInclude(p.lonDeg(), p.latDeg());
        for (MapPoint p : s.stations) e.expandToInclude(p.lonDeg(), p.latDeg());
        if (e.isNull()) return new double[] {-180, 180, -75, 80};
        return new double[] {e.getMinX(), e.getMaxX(), e.getMinY(), e.getMaxY()};
    }

    // ---- inspect ----
    private void hover(double lon, double lat) {
        boolean first = hoverAt == null;
        hoverAt = new double[] {lon, lat};
        if (!first) return;
        Platform.runLater(() -> {            // at most one inspector update per pulse
            double[] h = hoverAt;
            hoverAt = null;
            cursor.setText(org.gyreplan.app.desktop.map.Format.lat(h[1]) + "  " + org.gyreplan.app.desktop.map.Format.lon(h[0]));
            if (pinned == null) inspector.show(h[0], h[1], map.layers(), map.timeStepProperty().get(), timeBar.currentLabel(), false);
        });
    }

    private void refreshInspector() {
        if (pinned != null) {
            inspector.show(pinned[0], pinned[1], map.layers(), map.timeStepProperty().get(), timeBar.currentLabel(), true);
        }
    }

    private void pointClicked(MapPoint p) {
        for (MapStudy.IndexPoint ip : study.indexPoints) {
            if (ip.id().equals(p.id()) && ip.series() != null) {
                charts.show(ip.id(), ip.label(), ip.series(), map.timeStepProperty().get());
                if (centreSplit.getDividerPositions()[0] > 0.8) centreSplit.setDividerPositions(0.62);
                status.setText("Charts of " + ip.label());
                return;
            }
        }
    }

    // ---- edit ----
    private void polygonDrawn(Polygon p) {
        if (!p.isValid()) {
            error("The drawn polygon crosses itself; draw it again without crossing edges.", null);
            return;
        }
        addPolygon(p, drawTarget);
        selectTool(MapCanvas.Tool.NAVIGATE);
    }

    /** Adds a polygon as the basin (replacing it) or as one more exclusion zone. */
    public void addPolygon(Geometry g, DrawTarget target) {
        if (target == DrawTarget.BASIN) {
            study.basin = g;
            study.basinEdited = true;
            built.basin().setAll(List.of(new PolygonLayer.Item(g, null)));
            built.basin().setVisible(true);
            status.setText("Basin set (" + g.getCoordinates().length + " vertices). Save the scenario and run to use it.");
        } else {
            study.exclusions.add(g);
            study.exclusionsEdited = true;
            built.exclusions().add(g, null);
            built.exclusions().setVisible(true);
            status.setText("Exclusion zone added (" + study.exclusions.size() + " in total). Save and run to use it.");
        }
        map.redraw();
    }

    private void pointMoved(String what, MapPoint p) {
        movedPoints = true;
        status.setText(what + " " + p.label() + " moved to " + org.gyreplan.app.desktop.map.Format.lat(p.latDeg())
                + ", " + org.gyreplan.app.desktop.map.Format.lon(p.lonDeg()));
        if (study.cruise != null && study.cruise.stops().stream().noneMatch(s -> s.id().equals(p.id()))) {
            status.setText(status.getText() + " (not part of the cruise plan: schedule unchanged)");
        } else if (study.cruise != null) {
            try {
                study.cruise.move(p.id(), p.lonDeg(), p.latDeg());
                showPlan();
            } catch (RuntimeException ex) {
                error("Could not update the schedule", ex);
            }
        }
    }

    private void showPlan() {
        if (study.cruise == null) {
            plan.show(List.of(), null);
            return;
        }
        var sch = study.cruise.schedule();
        plan.show(study.cruise.rows(), String.format(java.util.Locale.ROOT,
                "Departs %s UTC — %s nmi, %s days in total (under way %s h, work and weather %s h)",
                CruisePlan.utc(sch.departure()), org.gyreplan.app.desktop.map.Format.tick(sch.totalDistanceNmi()),
                org.gyreplan.app.desktop.map.Format.tick(sch.totalDays()),
                org.gyreplan.app.desktop.map.Format.tick(sch.totalTransitHours()),
                org.gyreplan.app.desktop.map.Format.tick(sch.totalStationHours())));
        map.redraw();
    }

    /** Imports a polygon file (as basin or exclusion zone). */
    public void importPolygon(Path file, DrawTarget target) {
        try {
            List<PolygonFeature> fs = PolygonFiles.read(file);
            if (target == DrawTarget.BASIN) {
                if (fs.size() > 1) {
                    error(file + " holds " + fs.size() + " polygons; a basin file must hold exactly one", null);
                    return;
                }
                addPolygon(fs.get(0).polygon(), target);
            } else {
                for (PolygonFeature f : fs) addPolygon(f.polygon(), target);
            }
            status.setText("Imported " + fs.size() + " polygon(s) from " + file.getFileName());
        } catch (Exception ex) {
            error("Could not import " + file, ex);
        }
    }

    /** Saves the edited geometry and sites back to the scenario file. */
    public void saveScenario() {
        if (scenario == null || scenarioFiles == null) {
            error("No scenario file is open, or saving is not available in this build.", null);
            return;
        }
        try {
            scenarioFiles.save(scenario, study);
            status.setText("Saved " + scenario + (movedPoints
                    ? " — moved sites and stations are not stored: the scenario chooses them by its rules" : ""));
        } catch (Exception ex) {
            error("Could not save " + scenario, ex);
        }
    }

    // ---- run ----
    /** Starts the study in the background; returns the task (null if no scenario). */
    public Task<MapStudy> runStudy() {
        if (task != null && task.isRunning()) return task;
        if (scenario == null) {
            error("Open a scenario file first (File → Open scenario…).", null);
            return null;
        }
        CancelToken token = new CancelToken();
        cancelToken = token;
        Path scen = scenario;
        Path out = outputFolder(scen);
        Task<MapStudy> t = new Task<>() {
            @Override
            protected MapStudy call() throws Exception {
                return runner.run(scen, out, (stage, fraction, message) -> {
                    updateMessage(stage + (message == null || message.isEmpty() ? "" : ": " + message));
                    updateProgress(fraction < 0 ? -1 : fraction, 1);
                }, token);
            }
        };
        progress.progressProperty().bind(t.progressProperty());
        status.textProperty().bind(t.messageProperty());
        runButton.setDisable(true);
        cancelButton.setDisable(false);
        t.setOnSucceeded(e -> {
            finishRun();
            setStudy(t.getValue());
            status.setText("Study finished" + (study.warnings.isEmpty() ? "" : " with " + study.warnings.size() + " warning(s)"));
            System.err.println("gyreplan desktop: " + status.getText());
        });
        t.setOnCancelled(e -> { finishRun(); status.setText("Run cancelled"); });
        t.setOnFailed(e -> {
            finishRun();
            Throwable ex = t.getException();
            if (ex instanceof CancelledException) status.setText("Run cancelled");
            else error("The study could not be run", ex);
        });
        task = t;
        running = true;
        Thread th = new Thread(t, "gyreplan-study");
        th.setDaemon(true);
        th.start();
        return t;
    }

    /**
     * Where a run writes: {@code -Dgyreplan.out=<folder>} if set, else {@code gyreplan-output/<scenario folder>}
     * under the working directory (inputs are never written to).
     */
    static Path outputFolder(Path scenario) {
        String base = System.getProperty("gyreplan.out");
        Path parent = scenario.toAbsolutePath().getParent();
        String name = parent == null || parent.getFileName() == null ? "study" : parent.getFileName().toString();
        return base != null ? Path.of(base).toAbsolutePath() : Path.of("gyreplan-output", name).toAbsolutePath();
    }

    /** Asks the running study to stop. */
    public void cancelRun() {
        if (cancelToken != null) cancelToken.cancel();
        if (task != null) task.cancel(false);
    }

    /** Whether a study is running (any thread). */
    public boolean isRunning() { return running; }

    private void finishRun() {
        running = false;
        progress.progressProperty().unbind();
        status.textProperty().unbind();
        progress.setProgress(0);
        runButton.setDisable(false);
        cancelButton.setDisable(true);
    }

    // ---- export ----
    /** Writes the current map as a PNG (atomically). */
    public void exportPng(Path file) throws IOException {
        WritableImage img = map.snapshot();
        var buffered = SwingFXUtils.fromFXImage(img, null);
        AtomicWrite.write(file, out -> ImageIO.write(buffered, "png", out));
    }

    // ---- messages ----
    /** Shows a readable error in the status bar, the messages list and (unless turned off) a dialog. */
    public void error(String what, Throwable ex) {
        String text = what + (ex == null ? "" : ": " + describe(ex));
        System.err.println("gyreplan desktop: " + text);
        status.setText(text);
        messages.getItems().add(0, "Error — " + text);
        rightTabs.getTabs().get(2).setText("Messages (" + messages.getItems().size() + ")");
        if (dialogs) {
            Alert a = new Alert(Alert.AlertType.ERROR, text);
            a.setHeaderText(what);
            Window w = getScene() == null ? null : getScene().getWindow();
            if (w != null) a.initOwner(w);
            a.show();
        }
    }

    /** The messages of an exception and its causes, without Java class names where a message exists. */
    static String describe(Throwable ex) {
        List<String> parts = new ArrayList<>();
        for (Throwable t = ex; t != null && parts.size() < 4; t = t.getCause()) {
            String m = t.getMessage();
            String s = m == null || m.isBlank() ? t.getClass().getSimpleName() : m;
            if (!parts.contains(s) && (parts.isEmpty() || !parts.get(parts.size() - 1).contains(s))) parts.add(s);
        }
        return String.join(" — caused by: ", parts);
    }

    // ---- chrome ----
    private MenuBar menuBar() {
        MenuItem open = new MenuItem("Open scenario…");
        open.setOnAction(e -> chooseScenario());
        MenuItem save = new MenuItem("Save scenario");
        save.setOnAction(e -> saveScenario());
        MenuItem importBasin = new MenuItem("Import basin polygon…");
        importBasin.setOnAction(e -> choosePolygon(DrawTarget.BASIN));
        MenuItem importExcl = new MenuItem("Import exclusion zones…");
        importExcl.setOnAction(e -> choosePolygon(DrawTarget.EXCLUSION));
        MenuItem png = new MenuItem("Export map as PNG…");
        png.setOnAction(e -> choosePng());
        MenuItem outputs = new MenuItem("Show study outputs");
        outputs.setOnAction(e -> showOutputs());
        MenuItem copyOut = new MenuItem("Export study outputs to folder…");
        copyOut.setOnAction(e -> chooseOutputCopy());
        MenuItem quit = new MenuItem("Quit");
        quit.setOnAction(e -> Platform.exit());
        Menu file = new Menu("File", null, open, save, new javafx.scene.control.SeparatorMenuItem(), importBasin, importExcl,
                new javafx.scene.control.SeparatorMenuItem(), png, outputs, copyOut, new javafx.scene.control.SeparatorMenuItem(), quit);
        MenuItem run = new MenuItem("Run study");
        run.setOnAction(e -> runStudy());
        MenuItem cancel = new MenuItem("Cancel run");
        cancel.setOnAction(e -> cancelRun());
        Menu study = new Menu("Study", null, run, cancel);
        Menu view = new Menu("View");
        for (MapProjection p : MapProjection.values()) {
            MenuItem m = new MenuItem(p + " projection");
            m.setOnAction(e -> map.setProjection(p));
            view.getItems().add(m);
        }
        MenuItem fit = new MenuItem("Zoom to study");
        fit.setOnAction(e -> { double[] x = extentOf(this.study); map.fit(x[0], x[1], x[2], x[3]); });
        view.getItems().add(fit);
        return new MenuBar(file, study, view);
    }

    private ToolBar toolBar() {
        runButton.setId("runButton");
        cancelButton.setId("cancelButton");
        cancelButton.setDisable(true);
        runButton.getStyleClass().add("run-button");
        runButton.setOnAction(e -> runStudy());
        cancelButton.setOnAction(e -> cancelRun());
        ToggleButton nav = new ToggleButton("Navigate");
        ToggleButton basin = new ToggleButton("Draw basin");
        ToggleButton excl = new ToggleButton("Draw exclusion");
        nav.setId("toolNavigate");
        basin.setId("toolBasin");
        excl.setId("toolExclusion");
        for (ToggleButton b : List.of(nav, basin, excl)) b.setToggleGroup(tools);
        nav.setSelected(true);
        nav.setTooltip(new Tooltip("Drag to pan, scroll to zoom, click to read values; drag sites and stations to move them"));
        basin.setTooltip(new Tooltip("Click vertices, double-click (or Enter) to close; Esc cancels"));
        excl.setTooltip(new Tooltip("Click vertices, double-click (or Enter) to close; Esc cancels"));
        tools.selectedToggleProperty().addListener((o, a, b) -> {
            if (b == null) { nav.setSelected(true); return; }
            if (b == basin) { drawTarget = DrawTarget.BASIN; map.toolProperty().set(MapCanvas.Tool.DRAW_POLYGON); }
            else if (b == excl) { drawTarget = DrawTarget.EXCLUSION; map.toolProperty().set(MapCanvas.Tool.DRAW_POLYGON); }
            else map.toolProperty().set(MapCanvas.Tool.NAVIGATE);
        });
        ComboBox<MapProjection> proj = new ComboBox<>();
        proj.setId("projection");
        proj.getItems().addAll(MapProjection.values());
        proj.setValue(MapProjection.EQUIRECTANGULAR);
        proj.valueProperty().addListener((o, a, b) -> map.setProjection(b));
        Button png = new Button("Export PNG…");
        png.setOnAction(e -> choosePng());
        Button open = new Button("Open…");
        open.setOnAction(e -> chooseScenario());
        Button save = new Button("Save");
        save.setId("saveButton");
        save.setOnAction(e -> saveScenario());
        return new ToolBar(open, save, new Separator(), runButton, cancelButton, new Separator(), nav, basin, excl,
                new Separator(), new Label("Projection"), proj, new Separator(), png);
    }

    /** Selects a map tool as if its button were pressed. */
    public void selectTool(MapCanvas.Tool t) {
        String id = t == MapCanvas.Tool.NAVIGATE ? "toolNavigate" : drawTarget == DrawTarget.BASIN ? "toolBasin" : "toolExclusion";
        tools.getToggles().stream().filter(x -> id.equals(((ToggleButton) x).getId())).findFirst().ifPresent(x -> x.setSelected(true));
    }

    private HBox statusBar() {
        progress.setId("progress");
        progress.setPrefWidth(200);
        status.setId("status");
        cursor.setId("cursorPosition");
        cursor.setMinWidth(200);
        Region grow = new Region();
        HBox.setHgrow(grow, Priority.ALWAYS);
        HBox bar = new HBox(10, progress, status, grow, cursor);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.setPadding(new Insets(4, 8, 4, 8));
        bar.getStyleClass().add("status-bar");
        return bar;
    }

    private Window window() { return getScene() == null ? null : getScene().getWindow(); }

    private void chooseScenario() {
        FileChooser fc = new FileChooser();
        fc.setTitle("Open scenario");
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter("Scenario (YAML)", "*.yaml", "*.yml"));
        File f = fc.showOpenDialog(window());
        if (f != null) openScenario(f.toPath());
    }

    /** Makes a scenario the current one, shows its geometry if it can be read, and runs it. */
    public void openScenario(Path file) { openScenario(file, true); }

    /** Makes a scenario the current one and shows its geometry if it can be read; runs it if asked. */
    public void openScenario(Path file, boolean run) {
        scenario = file;
        titleSink.accept(windowTitle());
        if (scenarioFiles != null) {
            try {
                MapStudy s = scenarioFiles.preview(file);
                if (s != null) setStudy(s);
            } catch (Exception ex) {
                error("Could not read " + file, ex);
                return;
            }
        }
        if (run) runStudy();
    }

    private void choosePolygon(DrawTarget target) {
        FileChooser fc = new FileChooser();
        fc.setTitle(target == DrawTarget.BASIN ? "Import basin polygon" : "Import exclusion zones");
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter("Polygons (GeoJSON, WKT, Shapefile, GeoPackage)",
                "*.geojson", "*.json", "*.wkt", "*.txt", "*.shp", "*.gpkg"));
        File f = fc.showOpenDialog(window());
        if (f != null) importPolygon(f.toPath(), target);
    }

    private void choosePng() {
        FileChooser fc = new FileChooser();
        fc.setTitle("Export map as PNG");
        fc.setInitialFileName("map.png");
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter("PNG image", "*.png"));
        File f = fc.showSaveDialog(window());
        if (f == null) return;
        try {
            exportPng(f.toPath());
            status.setText("Map written to " + f);
        } catch (IOException ex) {
            error("Could not write " + f, ex);
        }
    }

    private void chooseOutputCopy() {
        if (study.outputs.isEmpty()) {
            error("No outputs yet: run the study first.", null);
            return;
        }
        javafx.stage.DirectoryChooser dc = new javafx.stage.DirectoryChooser();
        dc.setTitle("Export study outputs to");
        File d = dc.showDialog(window());
        if (d == null) return;
        try {
            int n = exportOutputs(d.toPath());
            status.setText("Copied " + n + " output files to " + d);
        } catch (IOException ex) {
            error("Could not copy the outputs to " + d, ex);
        }
    }

    /**
     * Copies every file the run wrote (CF netCDF, GeoTIFF, GeoJSON, GeoPackage, GPX, KML, CSV, maps, report…)
     * into a folder, keeping their relative paths; each file is written atomically. Returns the number copied.
     */
    public int exportOutputs(Path folder) throws IOException {
        int n = 0;
        for (var e : study.outputs.entrySet()) {
            Path src = Path.of(e.getValue());
            Path rel = Path.of(e.getKey());
            if (rel.isAbsolute() || rel.normalize().startsWith("..")) rel = src.getFileName();
            Path target = folder.resolve(rel.normalize());
            AtomicWrite.toFile(target, tmp -> java.nio.file.Files.copy(src, tmp));
            n++;
        }
        return n;
    }

    private void showOutputs() {
        messages.getItems().clear();
        if (study.outputs.isEmpty()) messages.getItems().add("No outputs yet: run the study first.");
        study.outputs.forEach((k, v) -> messages.getItems().add(k + ": " + v));
        rightTabs.getSelectionModel().select(2);
    }
}
