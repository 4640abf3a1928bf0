package org.gyreplan.app.report;

import org.gyreplan.app.pipeline.StudyPipeline;
import org.gyreplan.app.pipeline.StudyResult;
import org.gyreplan.app.scenario.Scenario;
import org.gyreplan.app.scenario.ScenarioFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import javax.imageio.ImageIO;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;

import static org.junit.jupiter.api.Assertions.*;

/**
 * The report renders in a real browser (Debian's headless chromium, installed by tools/fetch-test-deps.sh):
 * the screenshot exists and is not blank. Fails with a clear message when chromium is absent.
 */
class ReportBrowserTest {
    @TempDir Path dir;

    static Path chromium() {
        for (String c : List.of("/usr/bin/chromium", "/usr/bin/chromium-browser")) {
            if (Files.isExecutable(Path.of(c))) return Path.of(c);
        }
        return fail("chromium not found (/usr/bin/chromium); install it with tools/fetch-test-deps.sh (Debian package chromium)");
    }

    @Test
    void reportRendersInHeadlessChromium() throws Exception {
        Path s = org.gyreplan.app.pipeline.TestScenarios.small(dir, "Browser test study", "maps, report", "");
        Scenario sc = ScenarioFiles.load(s);
        StudyResult r = new StudyPipeline().run(sc, dir.resolve("out"), null, null);
        Path html = r.report().orElseThrow();
        String text = Files.readString(html);
        assertTrue(text.contains("Not for navigation"), "report carries the cautions");
        assertTrue(text.contains("data:image/png;base64,"), "images are embedded");
        assertFalse(text.contains("src=\"http"), "self-contained: no external resources");

        Path png = dir.resolve("shot.png");
        Path profile = Files.createDirectory(dir.resolve("profile"));
        Process p = new ProcessBuilder(chromium().toString(), "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run",
                "--user-data-dir=" + profile, "--screenshot=" + png, "--window-size=1400,3000", html.toUri().toString())
                .redirectErrorStream(true).redirectOutput(dir.resolve("chromium.log").toFile()).start();
        assertTrue(p.waitFor(90, TimeUnit.SECONDS), "chromium did not finish in 90 s");
        assertTrue(Files.isRegularFile(png), "no screenshot; chromium log:\n" + Files.readString(dir.resolve("chromium.log")));
        BufferedImage img = ImageIO.read(png.toFile());
        assertEquals(1400, img.getWidth());
        Set<Integer> colours = new HashSet<>();
        long nonWhite = 0;
        for (int y = 0; y < img.getHeight(); y += 3) {
            for (int x = 0; x < img.getWidth(); x += 3) {
                int rgb = img.getRGB(x, y) & 0xFFFFFF;
                colours.add(rgb);
                if (rgb != 0xFFFFFF) nonWhite++;
            }
        }
        assertTrue(colours.size() > 50, "screenshot looks blank: " + colours.size() + " colours");
        assertTrue(nonWhite > 10_000, "screenshot nearly white: " + nonWhite + " non-white samples");
        Files.copy(png, Path.of("target/report-screenshot.png"), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
    }
}
