package io.github.atomledger.checker.report;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.engine.MappingConfig;
import io.github.atomledger.checker.engine.RunResult;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Benchmark (issue #12): the pictures of yeast-GEM 9.0.2 (about 1,850 maps, mapped once per JVM
 * by {@link RealModelSweepTest#yeastMapped()}), printed for BENCHMARKS.md. Measures drawing every
 * picture on two threads without a cache, again from a warm cache into an empty report folder and
 * into a folder that has them, the HTML page and picture folder sizes, and headless Chromium's
 * screenshot time for the page as written (pictures as files, CSS backgrounds) against the page
 * with every drawing embedded inline (the alternative, built from the same files). Run with
 * {@code -Pbench}; skips without ../shared/data, and the browser part without Chromium.
 */
@Tag("bench")
class PicturesBenchmarkTest {

    @Test
    void yeastGemPicturesColdWarmAndInTheBrowser() throws Exception {
        RunResult result = RealModelSweepTest.yeastMapped();
        Path base = Path.of("target", "bench-pictures").toAbsolutePath();
        deleteTree(base);
        Path cache = base.resolve("cache");
        RunResult cached = withCache(result, cache);

        long t = System.nanoTime();
        new HtmlReporter().write(withCache(result, null), base.resolve("no-cache"));
        report("HTML with every picture drawn, no cache (2 threads)", t);
        t = System.nanoTime();
        new HtmlReporter().write(cached, base.resolve("cold"));
        report("HTML with every picture drawn into an empty cache", t);
        t = System.nanoTime();
        new HtmlReporter().write(cached, base.resolve("warm-empty-folder"));
        report("HTML from a warm cache into an empty report folder", t);
        t = System.nanoTime();
        new HtmlReporter().write(cached, base.resolve("warm-empty-folder"));
        report("HTML from a warm cache, pictures already in the folder", t);

        Path out = base.resolve("warm-empty-folder");
        long files;
        long bytes;
        try (Stream<Path> s = Files.list(out.resolve(PictureFiles.FOLDER))) {
            List<Path> all = s.toList();
            files = all.size();
            bytes = 0;
            for (Path p : all) {
                bytes += Files.size(p);
            }
        }
        System.out.printf("pictures: %d files, %,d bytes (%.1f kB each); report.html %,d bytes%n", files, bytes,
                bytes / 1000.0 / files, Files.size(out.resolve("report.html")));
        assertThat(files).isGreaterThan(1500);

        Path inline = out.resolve("inline.html");
        Files.writeString(inline, inlined(Files.readString(out.resolve("report.html")), out));
        System.out.printf("inline alternative: %,d bytes%n", Files.size(inline));
        String chromium = chromium();
        if (chromium == null) {
            System.out.println("chromium not installed: no browser figures");
            return;
        }
        for (int i = 0; i < 2; i++) {
            System.out.printf("chromium screenshot, pictures as files: %s%n", shoot(chromium, out.resolve("report.html")));
            System.out.printf("chromium screenshot, pictures inline:   %s%n", shoot(chromium, inline));
        }
    }

    private static RunResult withCache(RunResult r, Path cache) {
        MappingConfig m = r.config().mapping();
        return new RunResult(r.config().withMapping(new MappingConfig(m.enabled(), m.structures(), m.options(),
                2, cache)), r.models(), r.gate());
    }

    private static void report(String what, long start) {
        System.out.printf("%-60s %,8.0f ms%n", what, (System.nanoTime() - start) / 1e6);
    }

    /**
     * The page with each picture's SVG file pasted into its card instead of the background
     * reference (ids are unique per file, so pictures of one page would clash only in {@code
     * <defs>} ids, which does not change size or render time much).
     */
    static String inlined(String html, Path dir) throws IOException {
        Matcher m = Pattern.compile("<div class=\"pic\" role=\"img\"[^>]*style=\"--pic:url\\(pictures/([0-9a-f]{32}\\.svg)\\)[^\"]*\"></div>")
                .matcher(html);
        StringBuilder sb = new StringBuilder();
        while (m.find()) {
            String svg = Files.readString(dir.resolve(PictureFiles.FOLDER).resolve(m.group(1)));
            svg = svg.substring(svg.indexOf("<svg"));
            m.appendReplacement(sb, Matcher.quoteReplacement("<div class=\"pic-inline\">" + svg + "</div>"));
        }
        m.appendTail(sb);
        return sb.toString();
    }

    private static String chromium() {
        for (String dir : System.getenv().getOrDefault("PATH", "").split(File.pathSeparator)) {
            File f = new File(dir, "chromium");
            if (f.canExecute()) {
                return f.getAbsolutePath();
            }
        }
        return null;
    }

    /** Wall time of one headless screenshot at 1400 x 1000 with a fresh profile (or "timeout"). */
    private static String shoot(String chromium, Path page) throws IOException, InterruptedException {
        Path profile = Files.createTempDirectory("atomledger-bench-chromium-");
        Path png = page.resolveSibling(page.getFileName() + ".png");
        List<String> cmd = new ArrayList<>(List.of(chromium, "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update",
                "--disable-sync", "--user-data-dir=" + profile, "--screenshot=" + png, "--window-size=1400,1000",
                page.toUri().toString()));
        long t = System.nanoTime();
        Process p = new ProcessBuilder(cmd).redirectOutput(ProcessBuilder.Redirect.DISCARD)
                .redirectError(ProcessBuilder.Redirect.DISCARD).start();
        boolean done = p.waitFor(180, TimeUnit.SECONDS);
        double s = (System.nanoTime() - t) / 1e9;
        if (!done) {
            p.destroyForcibly();
        }
        deleteTree(profile);
        return done ? String.format("%.1f s (exit %d)", s, p.exitValue()) : "timeout after 180 s";
    }

    /** Deletes a tree as far as it can (Chromium may still be writing its profile as it exits). */
    private static void deleteTree(Path dir) {
        if (!Files.exists(dir)) {
            return;
        }
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.sorted(Comparator.reverseOrder()).toList()) {
                try {
                    Files.deleteIfExists(p);
                } catch (IOException e) {
                    // left behind in the temporary directory
                }
            }
        } catch (IOException | java.io.UncheckedIOException e) {
            // the same
        }
    }
}
