package org.tautline.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;

/**
 * Takes the workbench's screenshots at 200 % scale: starts its own virtual display of 2560x1600 and a
 * child JVM with {@code -Dsun.java2d.uiScale=2} running {@link HiDpiScreenshots}, then stops both.
 */
class HiDpiScreenshotTest {
    @Test
    void drawsEveryScreenAtTwiceTheScale() throws Exception {
        Path xvfb = Path.of("/usr/bin/Xvfb");
        if (!Files.isExecutable(xvfb)) {
            if (System.getenv("CI") != null) {
                throw new AssertionError("CI must provide Xvfb for the 200 % screenshots");
            }
            Assumptions.abort("no Xvfb: the 200 % screenshots need it");
        }
        int display = freeDisplay();
        Process server = new ProcessBuilder(xvfb.toString(), ":" + display, "-screen", "0", "2560x1600x24", "-nolisten",
                "tcp").redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        try {
            Path socket = Path.of("/tmp/.X11-unix/X" + display);
            for (int i = 0; i < 100 && !Files.exists(socket); i++) {
                Thread.sleep(50);
            }
            assertTrue(Files.exists(socket), "Xvfb :" + display + " did not start");
            String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
            ProcessBuilder child = new ProcessBuilder(List.of(java, "-Dsun.java2d.uiScale=2", "-Djava.awt.headless=false",
                    "-cp", System.getProperty("java.class.path"), HiDpiScreenshots.class.getName()));
            child.environment().put("DISPLAY", ":" + display);
            child.redirectErrorStream(true).redirectOutput(new File("target/hidpi-screenshots.log"));
            Process run = child.start();
            boolean finished = run.waitFor(120, TimeUnit.SECONDS);
            if (!finished) {
                run.destroyForcibly();
            }
            assertTrue(finished, "the 200 % run did not finish in 120 s; see target/hidpi-screenshots.log");
            assertEquals(0, run.exitValue(), "the 200 % run failed; see target/hidpi-screenshots.log:\n"
                    + Files.readString(Path.of("target/hidpi-screenshots.log")));
            BufferedImage results = ImageIO.read(SwingDriver.SHOTS.resolve("hidpi-5-results-1.png").toFile());
            assertEquals(2560, results.getWidth(), "a 1280-wide window at 200 % is 2560 pixels wide");
        } finally {
            server.destroy();
            server.waitFor(5, TimeUnit.SECONDS);
        }
    }

    private static int freeDisplay() {
        for (int n = 178; n < 250; n++) {
            if (!Files.exists(Path.of("/tmp/.X" + n + "-lock")) && !Files.exists(Path.of("/tmp/.X11-unix/X" + n))) {
                return n;
            }
        }
        throw new AssertionError("no free X display number between :178 and :249");
    }
}
