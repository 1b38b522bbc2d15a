package io.github.atomledger.checker.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.awt.image.BufferedImage;
import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Opens the demo's HTML report in a real browser: headless Chromium (Debian's {@code chromium},
 * which {@code .ci/run} installs when missing), offline, with a fresh profile. Checks the DOM the
 * browser built (summary cards, one card per reaction, the pictures) and the screenshot (the
 * drawings' Okabe–Ito colours are on screen). Skips with a message where Chromium cannot run.
 */
class HtmlBrowserTest {

    static final Path OUT = Path.of("target", "browser");
    static String chromium;
    static Path page;

    @BeforeAll
    static void writeReport() throws Exception {
        chromium = findChromium();
        assumeTrue(chromium != null, "chromium is not installed (Debian package 'chromium'); skipping the browser test");
        Files.createDirectories(OUT);
        new HtmlReporter().write(DemoReports.runMapped(), OUT);
        page = OUT.resolve("report.html").toAbsolutePath();
    }

    private static String findChromium() {
        String path = System.getenv("PATH");
        for (String dir : (path == null ? "" : path).split(File.pathSeparator)) {
            for (String name : new String[] {"chromium", "chromium-browser"}) {
                File f = new File(dir, name);
                if (f.canExecute()) {
                    return f.getAbsolutePath();
                }
            }
        }
        return null;
    }

    /** Runs Chromium with the given extra flags; returns stdout, or skips when it cannot run. */
    private static String browse(String... extra) throws IOException, InterruptedException {
        return browse(page, extra);
    }

    private static String browse(Path target, String... extra) throws IOException, InterruptedException {
        Path profile = Files.createTempDirectory("atomledger-chromium-");
        List<String> cmd = new ArrayList<>(List.of(chromium, "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update",
                "--disable-sync", "--user-data-dir=" + profile));
        cmd.addAll(List.of(extra));
        cmd.add(target.toUri().toString());
        Path stdout = Files.createTempFile(OUT.toAbsolutePath(), "chromium", ".out");
        Process p = new ProcessBuilder(cmd).redirectErrorStream(false).redirectOutput(stdout.toFile())
                .redirectError(ProcessBuilder.Redirect.DISCARD).start();
        boolean done = p.waitFor(180, TimeUnit.SECONDS);
        if (!done) {
            p.destroyForcibly();
        }
        assumeTrue(done && p.exitValue() == 0, "chromium could not render the page (exit "
                + (done ? p.exitValue() : "timeout") + "); skipping the browser test");
        String out = Files.readString(stdout, StandardCharsets.UTF_8);
        Files.deleteIfExists(stdout);
        return out;
    }

    @Test
    void browserBuildsTheSummaryTheReactionCardsAndThePictures() throws Exception {
        String dom = browse("--dump-dom");
        assumeTrue(!dom.isBlank(), "chromium printed no DOM; skipping the browser test");
        assertThat(dom).contains("AtomLedger report").contains("reactions by class").contains("findings by severity")
                .contains("atom maps");
        assertThat(count(dom, "<article")).isEqualTo(64);
        assertThat(count(dom, "<div class=\"pic\" role=\"img\"")).isGreaterThanOrEqualTo(20);
        assertThat(dom).contains("R_FBA").contains("fructose-bisphosphate aldolase");
    }

    @Test
    void browserBuildsThePathwaySectionWithItsStepsAndFates() throws Exception {
        // Issue #14: a section per pathway with its steps drawn in order beside a table of fates.
        String dom = browse("--dump-dom");
        assumeTrue(!dom.isBlank(), "chromium printed no DOM; skipping the browser test");
        assertThat(dom).contains("Carbon traces").contains("Pathway leucine").contains("Pathway phenylalanine")
                .contains("Where label can go");
        int start = dom.indexOf("<section class=\"traces\"");
        String traces = dom.substring(start, dom.indexOf("</section>", start));
        assertThat(count(traces, "<details class=\"pathway")).isEqualTo(5);
        assertThat(count(traces, "<table class=\"fates\"")).isEqualTo(5);
        assertThat(count(traces, "<figure class=\"tpic\"")).isGreaterThanOrEqualTo(25);
        assertThat(count(traces, "<svg")).isEqualTo(count(traces, "<figure class=\"tpic\""));
        assertThat(traces).contains("holds").doesNotContain("differs").doesNotContain("Not drawn: the drawing");
        assertThat(traces.indexOf("R_LEUTA")).isLessThan(traces.indexOf("R_BCKDH")).isLessThan(traces.indexOf("R_HMGCL"));
    }

    @Test
    void screenshotShowsTheCarbonColours() throws Exception {
        Path png = OUT.resolve("report.png").toAbsolutePath();
        Files.deleteIfExists(png);
        browse("--screenshot=" + png, "--window-size=1280,1600", "--hide-scrollbars");
        assumeTrue(Files.isRegularFile(png), "chromium wrote no screenshot; skipping");
        BufferedImage img = ImageIO.read(png.toFile());
        assertThat(img.getWidth()).isEqualTo(1280);
        // Okabe–Ito orange (#E69F00) and sky blue (#56B4E9) glows of the first reactant carbons
        assertThat(pixelsNear(img, 0xE6, 0x9F, 0x00)).isGreaterThan(200);
        assertThat(pixelsNear(img, 0x56, 0xB4, 0xE9)).isGreaterThan(200);
    }

    @Test
    void severityFilterHidesEveryCardWithoutAnError() throws Exception {
        // The demo has no error: with the "error" filter chosen no reaction card, so no drawing, shows.
        String html = Files.readString(page).replace("id=\"sev-all\" class=\"radio\" checked=\"checked\"",
                "id=\"sev-all\" class=\"radio\"").replace("id=\"sev-error\" class=\"radio\"",
                "id=\"sev-error\" class=\"radio\" checked=\"checked\"");
        assertThat(html).contains("id=\"sev-error\" class=\"radio\" checked=\"checked\"");
        Path filtered = OUT.resolve("filtered.html").toAbsolutePath();
        Files.writeString(filtered, html);
        Path png = OUT.resolve("filtered.png").toAbsolutePath();
        Files.deleteIfExists(png);
        browse(filtered, "--screenshot=" + png, "--window-size=1280,1600", "--hide-scrollbars");
        assumeTrue(Files.isRegularFile(png), "chromium wrote no screenshot; skipping");
        BufferedImage img = ImageIO.read(png.toFile());
        // sky blue (#56B4E9) appears only in the drawings
        assertThat(pixelsNear(img, 0x56, 0xB4, 0xE9)).isZero();
    }

    private static int count(String text, String needle) {
        return text.split(java.util.regex.Pattern.quote(needle), -1).length - 1;
    }

    private static int pixelsNear(BufferedImage img, int r, int g, int b) {
        int n = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int rgb = img.getRGB(x, y);
                int dr = ((rgb >> 16) & 0xff) - r;
                int dg = ((rgb >> 8) & 0xff) - g;
                int db = (rgb & 0xff) - b;
                if (dr * dr + dg * dg + db * db < 300) {
                    n++;
                }
            }
        }
        return n;
    }
}
