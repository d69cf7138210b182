package org.foldbook.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Properties;
import java.util.concurrent.TimeUnit;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.Test;

/**
 * Starts the real Foldbook product (Equinox launcher, E4 application, our application model) with its
 * self-check switched on, and checks the report it leaves: the main window was shown, the notebook,
 * recording and fold explorer parts were rendered (each photographed on its own), the demo notebook was written into the fresh workspace, and
 * the screenshot holds a real picture. The screenshot stays in
 * target/smoke/workbench.png for a person to look at.
 */
class WorkbenchSmokeTest {
    private static final long START_TIMEOUT_SECONDS = 180;

    @Test
    void productStartsAndRendersTheMainWindowAndParts() throws Exception {
        Path product = Path.of(System.getProperty("foldbook.product.dir"));
        Path out = Path.of(System.getProperty("foldbook.smoke.dir"));
        Files.createDirectories(out);
        Files.deleteIfExists(out.resolve("self-check.properties"));
        Files.deleteIfExists(out.resolve("workbench.png"));
        deleteTree(out.resolve("workspace")); // a fresh workspace: the first start writes the demo notebook

        List<String> command = new ArrayList<>();
        command.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        command.add("-Xmx1g");
        command.add("-Dfoldbook.selfCheck=" + out.toAbsolutePath());
        command.add("-jar");
        command.add(launcherJar(product).toString());
        command.add("-consoleLog");
        command.add("-data");
        command.add(out.resolve("workspace").toAbsolutePath().toString());
        command.add("-configuration");
        command.add(out.resolve("configuration").toAbsolutePath().toString());
        // the private configuration area needs the product's config.ini to know what to start
        Files.createDirectories(out.resolve("configuration"));
        Files.copy(product.resolve("configuration/config.ini"), out.resolve("configuration/config.ini"),
                java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        copyTree(product.resolve("configuration/org.eclipse.equinox.simpleconfigurator"),
                out.resolve("configuration/org.eclipse.equinox.simpleconfigurator"));

        Process process = new ProcessBuilder(command).directory(product.toFile())
                .redirectErrorStream(true).redirectOutput(out.resolve("console.log").toFile()).start();
        boolean exited = process.waitFor(START_TIMEOUT_SECONDS, TimeUnit.SECONDS);
        if (!exited) {
            process.destroyForcibly();
        }
        String console = Files.readString(out.resolve("console.log"));
        assertTrue(exited, "the workbench did not close itself within " + START_TIMEOUT_SECONDS + " s; console:\n" + console);

        Path reportFile = out.resolve("self-check.properties");
        assertTrue(Files.isRegularFile(reportFile), "no self-check report was written; console:\n" + console);
        Properties report = new Properties();
        try (InputStream in = Files.newInputStream(reportFile)) {
            report.load(in);
        }
        assertEquals("visible", report.getProperty("window.org.foldbook.app.window.main"), report.toString());
        assertEquals("Foldbook", report.getProperty("window.title"), report.toString());
        assertEquals("visible", report.getProperty("part.org.foldbook.ui.part.simulation"), report.toString());
        // the fold explorer is the tab behind the rate sweep: in the window, rendered when chosen
        assertTrue(report.containsKey("part.org.foldbook.ui.part.foldExplorer"), report.toString());
        // the self-check records the rate sweep's state: it follows the channel the Notebook part selects at
        // start, which has no kept run yet, so no what-if either
        assertTrue(report.getProperty("simulation.status", "").startsWith("No kept run of this channel"),
                report.toString());
        assertEquals("after a run", report.getProperty("simulation.whatIf"), report.toString());
        assertEquals("visible", report.getProperty("part.org.foldbook.ui.part.notebook"), report.toString());
        // the Simulation layout (Window ▸ Simulation layout) gives the rate sweep the window's height and most
        // of its width: at least 850 × 700 of the 1360 × 920 window, where the notebook layout's lower stack
        // leaves it about 320 pixels of height
        assertEquals("shown", report.getProperty("perspective.simulation"), report.toString());
        String[] sweep = report.getProperty("perspective.simulation.sweepSize", "0x0").split("x");
        assertTrue(Integer.parseInt(sweep[0]) >= 850 && Integer.parseInt(sweep[1]) >= 700, report.toString());
        assertTrue(distinctColours(ImageIO.read(out.resolve("perspective-simulation.png").toFile())) > 20,
                "the Simulation layout's screenshot is (nearly) a single colour");
        assertEquals("visible", report.getProperty("part.org.foldbook.ui.part.walkthrough"), report.toString());
        assertTrue(Files.isRegularFile(out.resolve("part-org.foldbook.ui.part.walkthrough.png")), report.toString());
        assertEquals("visible", report.getProperty("part.org.foldbook.ui.part.recording"), report.toString());
        // each part photographed on its own once shown (the recording view and the fold explorer share a stack)
        for (String part : new String[] {"recording", "foldExplorer"}) {
            String name = report.getProperty("part.org.foldbook.ui.part." + part + ".screenshot");
            assertEquals("part-org.foldbook.ui.part." + part + ".png", name, report.toString());
            BufferedImage partShot = ImageIO.read(out.resolve(name).toFile());
            assertTrue(distinctColours(partShot) > 20, name + " is (nearly) a single colour: nothing was drawn");
        }
        // first start: the demo notebook was written into the workspace (-data) and opened from there
        Path demo = out.resolve("workspace/demo/gearbox-stand.foldbook");
        assertTrue(Files.isRegularFile(demo), "no demo notebook at " + demo + "; console:\n" + console);
        assertTrue(Files.isRegularFile(out.resolve("workspace/demo/data/vibration-run1.wav")), "no demo recording");
        // a clean start logs neither a framework log entry nor an exception, on the console or in the
        // workspace log (-consoleLog copies entries to the console; the .log file is written as well)
        assertEquals(List.of(), problemLines(console), "the workbench logged problems; console:\n" + console);
        Path workspaceLog = out.resolve("workspace/.metadata/.log");
        if (Files.exists(workspaceLog)) {
            String log = Files.readString(workspaceLog);
            assertEquals(List.of(), problemLines(log), "the workspace log holds problems:\n" + log);
        }

        BufferedImage shot = ImageIO.read(out.resolve("workbench.png").toFile());
        assertTrue(shot.getWidth() >= 800 && shot.getHeight() >= 500, "screenshot too small: " + shot.getWidth() + "x" + shot.getHeight());
        assertTrue(distinctColours(shot) > 20, "the screenshot is (nearly) a single colour: nothing was drawn");
    }

    /** Lines that are a framework log entry ("!ENTRY", "!MESSAGE", "!STACK") or mention an exception. */
    static List<String> problemLines(String log) {
        return log.lines().filter(l -> l.startsWith("!ENTRY") || l.startsWith("!MESSAGE") || l.startsWith("!STACK")
                || l.contains("Exception")).toList();
    }

    private static Path launcherJar(Path product) throws IOException {
        try (DirectoryStream<Path> jars = Files.newDirectoryStream(product.resolve("plugins"), "org.eclipse.equinox.launcher_*.jar")) {
            for (Path jar : jars) {
                return jar;
            }
        }
        throw new IllegalStateException("no Equinox launcher jar in " + product.resolve("plugins") + ": is the product materialised?");
    }

    private static void copyTree(Path from, Path to) throws IOException {
        try (var paths = Files.walk(from)) {
            for (Path p : (Iterable<Path>) paths::iterator) {
                Path target = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(target);
                } else {
                    Files.copy(p, target, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
                }
            }
        }
    }

    private static void deleteTree(Path root) throws IOException {
        if (!Files.exists(root)) {
            return;
        }
        try (var paths = Files.walk(root)) {
            for (Path p : paths.sorted(java.util.Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        }
    }

    private static int distinctColours(BufferedImage image) {
        java.util.Set<Integer> colours = new java.util.HashSet<>();
        for (int y = 0; y < image.getHeight(); y += 7) {
            for (int x = 0; x < image.getWidth(); x += 7) {
                colours.add(image.getRGB(x, y));
            }
        }
        return colours.size();
    }
}
