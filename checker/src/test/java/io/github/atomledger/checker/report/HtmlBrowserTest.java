package io.github.atomledger.checker.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import io.github.atomledger.checker.SharedData;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunListener;
import io.github.atomledger.checker.engine.RunResult;

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
    void filtersOfferOnlyWhatOccursAndHideCards() throws Exception {
        // The demo has no error (its one warning is the dioxygenase's mapping.review): no error filter is
        // offered (issue #13). With the rule filter balance.exempt chosen, only exchange cards remain
        // (never drawn), and the pathways fold away.
        String html = Files.readString(page);
        assertThat(html).doesNotContain("id=\"sev-error\"").contains("id=\"sev-warning\"").contains("id=\"sev-info\"");
        html = html.replace("id=\"rule-all\" class=\"radio\" checked=\"checked\"", "id=\"rule-all\" class=\"radio\"")
                .replace("id=\"rule-balance_exempt\" class=\"radio\"", "id=\"rule-balance_exempt\" class=\"radio\" checked=\"checked\"");
        assertThat(html).contains("id=\"rule-balance_exempt\" class=\"radio\" checked=\"checked\"");
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

    // Issue #13: the first screen (1280 x 900) names what fails, before any reaction card.
    @Test
    void firstScreenOfThePlantedEcoliCoreNamesAtpsFormulaAsTheLikelyCause() throws Exception {
        Path model = SharedData.require("e_coli_core.xml");
        Path dir = OUT.resolve("ecoli");
        Files.createDirectories(dir);
        RunResult run = new Engine().run(RunConfig.defaults(model.getParent(), List.of(model.getFileName().toString())),
                RunListener.SILENT);
        new HtmlReporter().write(run, dir);
        List<String[]> probe = firstScreen(dir.resolve("report.html"));
        int height = Integer.parseInt(probe.get(0)[1]);
        String[] cause = probe.stream().filter(p -> p[0].equals("P")).findFirst().orElseThrow();
        assertThat(Integer.parseInt(cause[1])).isBetween(0, height - 40);
        assertThat(cause[2]).contains("ATP").contains("C30H12N5O13P3").contains("C10H12N5O13P3");
        String[] fails = probe.stream().filter(p -> p[0].equals("H2") && p[2].contains("fail the build")).findFirst().orElseThrow();
        assertThat(fails[2]).startsWith("12 errors fail the build");
        assertThat(Integer.parseInt(fails[1])).isBetween(0, height - 40);
        String[] firstCard = probe.stream().filter(p -> p[0].equals("ARTICLE")).findFirst().orElseThrow();
        assertThat(Integer.parseInt(firstCard[1])).isGreaterThan(Integer.parseInt(fails[1]));
    }

    @Test
    void firstScreenOfTheDemoSaysNothingFails() throws Exception {
        List<String[]> probe = firstScreen(page);
        int height = Integer.parseInt(probe.get(0)[1]);
        String[] verdict = probe.stream().filter(p -> p[0].equals("H2")).findFirst().orElseThrow();
        assertThat(verdict[2]).isEqualTo("Nothing fails the build");
        assertThat(Integer.parseInt(verdict[1])).isBetween(0, height);
    }

    /**
     * Opens a copy of the page with a probe script (the report itself has none) and returns, for the
     * overview's headings and causes and the first reaction cards, tag, top in CSS pixels and text;
     * the first entry is the viewport height.
     */
    private static List<String[]> firstScreen(Path html) throws Exception {
        String probe = "<script>(function(){var r=['VH|'+window.innerHeight+'|'];"
                + "document.querySelectorAll('section.overview h2, section.overview p.cause, article.rxn').forEach("
                + "function(e,i){if(i<30){r.push(e.tagName+'|'+Math.round(e.getBoundingClientRect().top)+'|'"
                + "+e.textContent.replace(/\\s+/g,' ').trim().slice(0,600));}});"
                + "var p=document.createElement('pre');p.id='probe';p.textContent=r.join('\\n');"
                + "document.body.appendChild(p);})();</script>";
        Path probed = html.resolveSibling("probed-" + html.getFileName());
        Files.writeString(probed, Files.readString(html).replace("</body>", probe + "</body>"));
        String dom = browse(probed.toAbsolutePath(), "--dump-dom", "--window-size=1280,900");
        int start = dom.indexOf("<pre id=\"probe\">");
        assumeTrue(start >= 0, "chromium ran no script; skipping");
        String text = dom.substring(start + "<pre id=\"probe\">".length(), dom.indexOf("</pre>", start))
                .replace("&amp;", "&").replace("&lt;", "<").replace("&gt;", ">").replace("&quot;", "\"");
        List<String[]> out = new ArrayList<>();
        for (String line : text.split("\n")) {
            out.add(line.split("\\|", 3));
        }
        return out;
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
