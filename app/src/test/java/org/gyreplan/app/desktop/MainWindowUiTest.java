package org.gyreplan.app.desktop;

import javafx.geometry.Point2D;
import javafx.scene.Scene;
import javafx.scene.control.CheckBox;
import javafx.scene.image.WritableImage;
import javafx.stage.Stage;
import org.gyreplan.app.desktop.map.MapCanvas;
import org.gyreplan.app.desktop.map.MapLayer;
import org.gyreplan.app.desktop.map.MapPoint;
import org.gyreplan.app.desktop.study.MapStudy;
import org.gyreplan.app.desktop.study.StudyLayers;
import org.gyreplan.solver.progress.CancelledException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

import javax.imageio.ImageIO;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Drives the main window headless (TestFX + Monocle) on a small synthetic study: open, toggle a layer, move the
 * time slider, click a point and read a value, draw a polygon, drag a station, run and cancel, and save a screenshot.
 */
@ExtendWith(ApplicationExtension.class)
class MainWindowUiTest {
    static {
        // Monocle's headless screen must be larger than the window (default 1280×800)
        System.setProperty("headless.geometry", "1600x1000-32");
    }

    private MainWindow window;
    private Stage stage;
    /** The test runner waits here until the test lets it finish; counts progress calls. */
    private final CountDownLatch started = new CountDownLatch(1);
    private final AtomicInteger loops = new AtomicInteger();

    @org.junit.jupiter.api.io.TempDir Path tmp;

    @Start
    void start(Stage stage) throws Exception {
        this.stage = stage;
        StudyRunner runner = (scenario, out, progress, cancel) -> {
            for (int k = 0; k < 100000; k++) {
                progress.progress("test stage", k / 100000.0, "step " + k);
                started.countDown();
                loops.incrementAndGet();
                cancel.check();
                Thread.sleep(2);
            }
            return SyntheticStudy.build();
        };
        Path scen = tmp.resolve("scenario.yaml");
        Files.writeString(scen, "# test placeholder\n");
        window = new MainWindow(runner, null, scen);
        window.setDialogs(false);
        window.setStudy(SyntheticStudy.build());
        stage.setScene(new Scene(window, 1400, 880));
        stage.show();
    }

    private MapLayer layer(String title) {
        return window.map().layers().stream().filter(l -> l.title().startsWith(title)).findFirst().orElseThrow();
    }

    /** Screen position of a lon/lat on the map. */
    private Point2D screenOf(double lon, double lat) {
        MapCanvas m = window.map();
        return m.canvas().localToScreen(m.viewport().screenX(lon), m.viewport().screenY(lat));
    }

    @Test
    void opensWithLayersColourBarAndTimeSliderAndSavesScreenshot(FxRobot robot) throws Exception {
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(window.map().layers().size() >= 10, "layers: " + window.map().layers());
        assertEquals(12, (int) window.timeBar().slider().getMax() + 1);
        assertFalse(window.map().colourBarLayers().isEmpty(), "a colour bar is shown");
        assertTrue(robot.lookup("#caution").queryLabeled().getText().contains("Not for navigation"));
        // show the charts of an index point so the screenshot shows the whole workspace
        robot.clickOn(screenOf(-21, 27));
        WaitForAsyncUtils.waitForFxEvents();
        Path dir = Path.of("target", "screenshots");
        Files.createDirectories(dir);
        WritableImage[] img = new WritableImage[1];
        robot.interact(() -> img[0] = stage.getScene().snapshot(null));
        ImageIO.write(javafx.embed.swing.SwingFXUtils.fromFXImage(img[0], null), "png", dir.resolve("main-window.png").toFile());
        Path png = dir.resolve("map.png");
        robot.interact(() -> {
            try { window.exportPng(png); } catch (Exception e) { throw new RuntimeException(e); }
        });
        var read = ImageIO.read(png.toFile());
        assertEquals((int) window.map().canvas().getWidth(), read.getWidth());

        // export of the run's files: copied byte for byte under their relative paths
        Path runDir = Files.createDirectories(tmp.resolve("run"));
        Files.createDirectories(runDir.resolve("maps"));
        Files.write(runDir.resolve("maps/psi.png"), new byte[] {1, 2, 3});
        Files.writeString(runDir.resolve("index.csv"), "a,b\n1,2\n");
        window.study().outputs.put("maps/psi.png", runDir.resolve("maps/psi.png").toString());
        window.study().outputs.put("index.csv", runDir.resolve("index.csv").toString());
        Path dest = tmp.resolve("export");
        assertEquals(2, window.exportOutputs(dest));
        assertEquals(-1, Files.mismatch(runDir.resolve("maps/psi.png"), dest.resolve("maps/psi.png")));
        assertEquals(-1, Files.mismatch(runDir.resolve("index.csv"), dest.resolve("index.csv")));
    }

    @Test
    void togglingALayerCheckBoxHidesIt(FxRobot robot) {
        MapLayer land = layer(StudyLayers.LAND);
        assertTrue(land.isVisible());
        CheckBox box = robot.lookup("#layerList").lookup(".check-box")
                .match(n -> ((CheckBox) n).getText().equals(StudyLayers.LAND)).queryAs(CheckBox.class);
        long before = window.map().redrawCount();
        robot.clickOn(box);
        WaitForAsyncUtils.waitForFxEvents();
        assertFalse(land.isVisible());
        assertTrue(window.map().redrawCount() > before, "map redrawn");
        // move it up one place: selection then the Up button
        robot.interact(() -> window.layerPanel().list().getSelectionModel().select(land));
        int k = window.map().layers().indexOf(land);
        robot.clickOn("#layerUp");
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(k + 1, window.map().layers().indexOf(land));

        // a typed colour range for the signed curl layer stays centred on zero
        MapLayer curl = layer("Wind-stress curl");
        robot.interact(() -> window.layerPanel().list().getSelectionModel().select(curl));
        robot.interact(() -> {
            ((javafx.scene.control.TextField) robot.lookup("#rangeMin").query()).setText("-5e-8");
            ((javafx.scene.control.TextField) robot.lookup("#rangeMax").query()).setText("2e-8");
        });
        robot.clickOn("#rangeApply");
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(-5e-8, curl.colourScale().min(), 1e-20);
        assertEquals(5e-8, curl.colourScale().max(), 1e-20);
    }

    @Test
    void timeSliderMovesMapInspectorAndChartMarker(FxRobot robot) {
        robot.clickOn(screenOf(-21, 32));                       // index point 3 → charts
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("P3", window.charts().shownId());
        double before = window.charts().markerYear();
        robot.interact(() -> window.timeBar().slider().setValue(6));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(6, window.map().timeStepProperty().get());
        assertEquals("2001-07  (7/12)", robot.lookup("#timeLabel").queryLabeled().getText());
        assertTrue(window.charts().markerYear() > before, "chart marker moved with the slider");
        // the pinned inspector follows the step: the curl there is the analytic value of month 7 (cell 32.5° N)
        String shown = window.inspector().valueOf("Wind-stress curl");
        assertNotNull(shown);
        double v = Double.parseDouble(shown.split(" ")[0]);
        assertEquals(SyntheticStudy.curlAt(32.5, 6), v, 1e-3 * Math.abs(v), "curl at the clicked cell, month 7");
    }

    @Test
    void clickingTheMapShowsDepthAndFieldValuesWithUnits(FxRobot robot) {
        double lon = -35.5, lat = 30.5;                           // a cell centre
        robot.clickOn(screenOf(lon, lat));
        WaitForAsyncUtils.waitForFxEvents();
        String depth = window.inspector().valueOf("Depth");
        assertNotNull(depth, "depth shown");
        assertTrue(depth.endsWith(" m"), depth);
        assertEquals(SyntheticStudy.depthAt(lon), Double.parseDouble(depth.split(" ")[0]), 0.5, "depth at the cell");
        String curl = window.inspector().valueOf("Wind-stress curl");
        assertTrue(curl.endsWith("N m-3"), curl);
        assertNotNull(window.inspector().valueOf("Surface stress, magnitude"));

        // scroll-zoom about the cursor keeps the place under it (within a pixel)
        var v = window.map().viewport();
        double scale = v.scale();
        Point2D before = screenOf(lon, lat);
        robot.moveTo(before);
        robot.scroll(3, javafx.geometry.VerticalDirection.UP);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(Math.abs(v.scale() / scale - 1) > 0.01, "zoomed: " + scale + " → " + v.scale());
        assertEquals(before.getX(), screenOf(lon, lat).getX(), 1.0);
        assertEquals(before.getY(), screenOf(lon, lat).getY(), 1.0);
        // in Mercator the same cell gives the same depth
        robot.interact(() -> window.map().setProjection(org.gyreplan.app.desktop.map.MapProjection.MERCATOR));
        robot.clickOn(screenOf(-30.5, 40.5));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(SyntheticStudy.depthAt(-30.5), Double.parseDouble(window.inspector().valueOf("Depth").split(" ")[0]), 0.5);
    }

    @Test
    void drawingAPolygonAddsAnExclusionZone(FxRobot robot) {
        int before = window.study().exclusions.size();
        robot.clickOn("#toolExclusion");
        robot.clickOn(screenOf(-50, 20));
        robot.clickOn(screenOf(-45, 20));
        robot.clickOn(screenOf(-45, 25));
        robot.clickOn(screenOf(-50, 25));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(4, window.map().sketch().size());
        robot.type(javafx.scene.input.KeyCode.ENTER);           // closes the ring
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(before + 1, window.study().exclusions.size());
        var poly = window.study().exclusions.get(before);
        assertEquals(5, poly.getCoordinates().length, poly.toText());
        double degPerPx = 1 / window.map().viewport().scale();
        assertEquals(25.0, poly.getArea(), 20 * degPerPx, "5°×5° square, within a pixel per side");
        assertEquals(MapCanvas.Tool.NAVIGATE, window.map().toolProperty().get());

        // a double-click closes too (events fired directly: robot double-clicks are timing-sensitive under load)
        robot.clickOn("#toolBasin");
        var c = window.map().overlay();
        double[][] pts = {{-55, 18}, {-30, 18}, {-30, 40}, {-55, 40}};
        robot.interact(() -> {
            for (int k = 0; k < pts.length; k++) {
                double x = window.map().viewport().screenX(pts[k][0]), y = window.map().viewport().screenY(pts[k][1]);
                c.fireEvent(mouse(javafx.scene.input.MouseEvent.MOUSE_PRESSED, x, y, 1));
                c.fireEvent(mouse(javafx.scene.input.MouseEvent.MOUSE_RELEASED, x, y, 1));
                if (k == pts.length - 1) {
                    c.fireEvent(mouse(javafx.scene.input.MouseEvent.MOUSE_PRESSED, x, y, 2));
                    c.fireEvent(mouse(javafx.scene.input.MouseEvent.MOUSE_RELEASED, x, y, 2));
                }
            }
        });
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(25.0 * 22.0, window.study().basin.getArea(), 100 * degPerPx, window.study().basin.toText());
        assertEquals(1, window.layers().basin().items().size());
    }

    private static javafx.scene.input.MouseEvent mouse(javafx.event.EventType<javafx.scene.input.MouseEvent> type,
                                                       double x, double y, int clicks) {
        return new javafx.scene.input.MouseEvent(type, x, y, x, y, javafx.scene.input.MouseButton.PRIMARY, clicks,
                false, false, false, false, type == javafx.scene.input.MouseEvent.MOUSE_PRESSED, false, false,
                false, false, false, null);
    }

    @Test
    void draggingAStationUpdatesTheSchedule(FxRobot robot) {
        MapPoint s5 = window.study().stations.get(4);
        String before = window.plan().totalsText();
        robot.drag(screenOf(s5.lonDeg(), s5.latDeg())).dropTo(screenOf(-30, 35));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(-30, s5.lonDeg(), 0.2);
        assertEquals(35, s5.latDeg(), 0.2);
        assertNotEquals(before, window.plan().totalsText());
        // the leg S4 → S5 is re-sailed to the new position: compare with the haversine distance on a 6371 km sphere
        // (Sinnott 1984); the solver measures on the WGS 84 ellipsoid, which differs from the sphere by < 0.6 %.
        var leg = window.study().cruise.schedule().rows().stream().filter(r -> r.toId().equals("S5")).findFirst().orElseThrow();
        double expectedNmi = SyntheticStudy.haversineKm(28, -28, s5.latDeg(), s5.lonDeg()) / 1.852;
        assertEquals(expectedNmi, leg.distanceNmi(), 0.006 * expectedNmi);
        assertTrue(window.plan().table().getItems().stream().anyMatch(r -> r.getLeg().equals("S4 → S5")
                && r.getDistance().equals(org.gyreplan.app.desktop.map.Format.tick(leg.distanceNmi()))), "table shows the new leg");
    }

    @Test
    void runShowsProgressAndCancelStopsIt(FxRobot robot) throws Exception {
        robot.clickOn("#runButton");
        assertTrue(started.await(10, TimeUnit.SECONDS), "runner started");
        WaitForAsyncUtils.waitFor(10, TimeUnit.SECONDS, () -> window.isRunning());
        WaitForAsyncUtils.waitForFxEvents();
        assertFalse(robot.lookup("#cancelButton").queryButton().isDisabled());
        robot.clickOn("#cancelButton");
        WaitForAsyncUtils.waitFor(10, TimeUnit.SECONDS, () -> !window.isRunning());
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("Run cancelled", window.statusText());
        int after = loops.get();
        assertTrue(after < 100000, "runner stopped early");
        assertFalse(robot.lookup("#runButton").queryButton().isDisabled());
    }

    @Test
    void aFailingRunShowsAReadableMessage(FxRobot robot) throws Exception {
        robot.interact(() -> {});
        var w = new MainWindow((s, o, p, c) -> {
            throw new IllegalArgumentException("scenario.yaml: field 'wind.file': file not found: winds.nc",
                    new java.nio.file.NoSuchFileException("winds.nc"));
        }, null, Path.of("scenario.yaml"));
        w.setDialogs(false);
        var t = new java.util.concurrent.atomic.AtomicReference<javafx.concurrent.Task<MapStudy>>();
        robot.interact(() -> t.set(w.runStudy()));
        WaitForAsyncUtils.waitFor(10, TimeUnit.SECONDS, () -> t.get().isDone());
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(w.statusText().contains("field 'wind.file'"), w.statusText());
        assertTrue(w.messages().getItems().get(0).startsWith("Error"), w.messages().getItems().toString());
        assertFalse(w.statusText().contains("IllegalArgumentException"), "no Java class names");
        assertTrue(CancelledException.class.getSimpleName().length() > 0);
    }
}
