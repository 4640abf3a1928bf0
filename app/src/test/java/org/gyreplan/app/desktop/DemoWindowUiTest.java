package org.gyreplan.app.desktop;

import javafx.scene.Scene;
import javafx.scene.image.WritableImage;
import javafx.stage.Stage;
import org.gyreplan.app.desktop.study.StudyLayers;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

import javax.imageio.ImageIO;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The window on the demo scenario with the real pipeline service (headless). */
@ExtendWith(ApplicationExtension.class)
class DemoWindowUiTest {
    static {
        System.setProperty("headless.geometry", "1600x1000-32");
    }

    private MainWindow window;
    private Stage stage;
    private final CountDownLatch firstProgress = new CountDownLatch(1);
    private final CountDownLatch release = new CountDownLatch(1);

    @TempDir Path out;

    @Start
    void start(Stage stage) {
        this.stage = stage;
        StudyRunner real = DesktopServices.runner();
        // the real pipeline, with a listener that holds the first progress call until the test has pressed Cancel
        StudyRunner held = (scen, o, progress, cancel) -> real.run(scen, out.resolve("run"), (st, f, m) -> {
            progress.progress(st, f, m);
            if (firstProgress.getCount() > 0) {
                firstProgress.countDown();
                try { release.await(20, TimeUnit.SECONDS); } catch (InterruptedException e) { Thread.currentThread().interrupt(); }
            }
        }, cancel);
        window = new MainWindow(held, DesktopServices.scenarioFiles(), null);
        window.setDialogs(false);
        stage.setScene(new Scene(window, 1400, 880));
        stage.show();
        window.openScenario(DemoScenarioTest.demo(), false);
    }

    @Test
    void opensTheDemoWithBasinExclusionsAndPort(FxRobot robot) throws Exception {
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(1, window.layers().basin().items().size());
        assertFalse(window.layers().exclusions().items().isEmpty());
        assertTrue(window.map().layers().stream().anyMatch(l -> l.title().equals(StudyLayers.PORT)));
        assertTrue(window.scenario().endsWith(Path.of("demo", "scenario.yaml")));
        Path dir = Path.of("target", "screenshots");
        Files.createDirectories(dir);
        WritableImage[] img = new WritableImage[1];
        robot.interact(() -> img[0] = stage.getScene().snapshot(null));
        ImageIO.write(javafx.embed.swing.SwingFXUtils.fromFXImage(img[0], null), "png", dir.resolve("demo-opened.png").toFile());
    }

    @Test
    void runningTheDemoCanBeCancelledAndLeavesNoOutputs(FxRobot robot) throws Exception {
        robot.clickOn("#runButton");
        assertTrue(firstProgress.await(30, TimeUnit.SECONDS), "pipeline reported progress");
        WaitForAsyncUtils.waitForFxEvents();
        robot.clickOn("#cancelButton");
        release.countDown();
        WaitForAsyncUtils.waitFor(30, TimeUnit.SECONDS, () -> !window.isRunning());
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("Run cancelled", window.statusText());
        assertFalse(Files.exists(out.resolve("run")) && Files.list(out.resolve("run")).findAny().isPresent(),
                "a cancelled run leaves no outputs");
    }

    @Test
    @Tag("slow")
    void runningTheDemoShowsTheResult(FxRobot robot) throws Exception {
        release.countDown();
        robot.clickOn("#runButton");
        WaitForAsyncUtils.waitFor(600, TimeUnit.SECONDS, () -> !window.isRunning());
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(window.statusText().startsWith("Study finished"), window.statusText());
        assertFalse(window.study().scalars.isEmpty());
        assertFalse(window.study().indexPoints.isEmpty(), "coastal index points");
        // July of the first year, then the charts of the first index point
        robot.interact(() -> window.timeBar().setStep(6));
        var ip = window.study().indexPoints.get(0);
        robot.interact(() -> {
            var v = window.map().viewport();
            window.map().canvas().localToScreen(v.screenX(ip.lonDeg()), v.screenY(ip.latDeg()));
        });
        robot.clickOn(window.map().canvas().localToScreen(window.map().viewport().screenX(ip.lonDeg()),
                window.map().viewport().screenY(ip.latDeg())));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(ip.id(), window.charts().shownId());
        if (window.study().cruise != null) {
            assertFalse(window.plan().table().getItems().isEmpty(), "schedule shown");
            var st = window.study().stations.isEmpty() ? window.study().moorings.get(0) : window.study().stations.get(0);
            String before = window.plan().totalsText();
            robot.interact(() -> {
                window.study().cruise.move(st.id(), st.lonDeg() - 0.3, st.latDeg());
            });
            assertFalse(before.isEmpty());
        }
        Path dir = Path.of("target", "screenshots");
        Files.createDirectories(dir);
        WritableImage[] img = new WritableImage[1];
        robot.interact(() -> img[0] = stage.getScene().snapshot(null));
        ImageIO.write(javafx.embed.swing.SwingFXUtils.fromFXImage(img[0], null), "png", dir.resolve("demo-result.png").toFile());
        robot.clickOn(robot.lookup(".tab-label").match(n -> "Plan".equals(((javafx.scene.control.Labeled) n).getText()))
                .queryAs(javafx.scene.Node.class));
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(robot.lookup("#caution").queryLabeled().isVisible(), "caution visible with the plan");
        robot.interact(() -> img[0] = stage.getScene().snapshot(null));
        ImageIO.write(javafx.embed.swing.SwingFXUtils.fromFXImage(img[0], null), "png", dir.resolve("demo-plan.png").toFile());
    }
}
