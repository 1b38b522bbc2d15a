package io.github.atomledger.checker.report;

import io.github.atomledger.checker.engine.ReportFormat;
import io.github.atomledger.checker.Version;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.MappingConfig;
import io.github.atomledger.checker.engine.ReactionResult;
import io.github.atomledger.checker.engine.RunResult;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.TreeMap;
import java.util.TreeSet;
import javax.xml.stream.XMLStreamException;

/**
 * Writes {@code report.html} and its {@code pictures/} folder: one page (inline CSS, no scripts,
 * nothing fetched from the network) that opens offline, with each atom-map drawing an SVG file
 * in {@code pictures/} that the page loads lazily (so a genome-scale report opens at once; see
 * DEVELOPERS.md for the measurement behind this). Per model a summary (reactions by class, findings by
 * severity, mapping status when mapping data is present, model-level findings), then one card per
 * reaction: the equation with species names and ids, the balance table, the findings, the fix
 * hint from the finding data ({@code fix.*}) and, when the {@link MappingSource} has one, the
 * drawing of the atom map. Filters by severity, rule and mapping status work without scripts.
 *
 * <p>Markup is written with {@code XMLStreamWriter} (serialised as HTML5-compatible XML: every
 * non-void element has an end tag), so the file is also well-formed XML. Same result, same bytes.
 */
public final class HtmlReporter implements Reporter {

    static final String NO_MAP = "no-map";

    /**
     * The most drawings one report holds (each an SVG file of some 10 to 150 kB, drawn once and
     * then cached); later ones are left out.
     */
    public static final int MAX_PICTURES = 10_000;

    private final MappingSource mappings;

    public HtmlReporter() {
        this(MappingSource.FROM_ENGINE);
    }

    /** A reporter that draws the atom maps this source provides. */
    public HtmlReporter(MappingSource mappings) {
        this.mappings = Objects.requireNonNull(mappings, "mappings");
    }

    @Override
    public ReportFormat format() {
        return ReportFormat.HTML;
    }

    /**
     * Writes {@code report.html} and the SVG files it shows into {@code pictures/} beside it.
     *
     * @throws IllegalStateException naming the reaction, when a drawing fails for a reason other than CDK
     */
    @Override
    public Path write(RunResult result, Path directory) throws IOException {
        Path file = directory.resolve(ReportFormat.HTML.fileName());
        try {
            ReportFiles.write(file, page(result, directory));
        } catch (java.io.UncheckedIOException e) {
            throw e.getCause();
        }
        return file;
    }

    /**
     * The page, exactly the bytes {@link #write} puts in the file; the pictures it refers to are
     * drawn (or taken from the cache) but not written.
     */
    public String toHtml(RunResult result) {
        return page(result, null);
    }

    private String page(RunResult result, Path directory) {
        try {
            Map<ModelResult, Map<String, MapPicture>> maps = new LinkedHashMap<>();
            TreeSet<String> rules = new TreeSet<>();
            TreeSet<String> statuses = new TreeSet<>();
            for (ModelResult m : result.models()) {
                Map<String, MapPicture> mm = new LinkedHashMap<>();
                for (ReactionResult r : m.reactions()) {
                    Optional<MapPicture> rm = mappings.mapping(m, r);
                    rm.ifPresent(x -> mm.put(r.id(), x));
                    statuses.add(rm.map(MapPicture::status).orElse(NO_MAP));
                }
                maps.put(m, mm);
                m.allFindings().forEach(f -> rules.add(f.ruleId()));
            }
            drawPictures(result, maps, directory);
            List<String> severities = List.of("error", "warning", "info", "clean");
            List<String> ruleTokens = rules.stream().map(HtmlReporter::token).toList();

            XmlOut x = new XmlOut();
            x.doctype("<!DOCTYPE html>");
            x.start("html").attr("lang", "en").nl();
            x.start("head").nl();
            x.empty("meta").attr("charset", "utf-8").nl();
            x.empty("meta").attr("name", "viewport").attr("content", "width=device-width, initial-scale=1").nl();
            x.empty("meta").attr("name", "generator").attr("content", "AtomLedger " + Version.get()).nl();
            x.leaf("title", null, "AtomLedger report").nl();
            x.start("style").text(HtmlStyle.BASE).text(HtmlTraces.STYLE).text(HtmlStyle.filters(severities, ruleTokens,
                    new ArrayList<>(statuses))).text(HtmlTraces.filters(severities, ruleTokens)).end().nl();
            x.end().nl();
            x.start("body").nl();
            header(x, result);
            filterInputs(x, "sev", severities);
            filterInputs(x, "rule", ruleTokens);
            filterInputs(x, "st", new ArrayList<>(statuses));
            x.empty("input").attr("type", "checkbox").attr("id", "show-idx").attr("class", "radio").nl();
            nav(x, severities, new ArrayList<>(rules), new ArrayList<>(statuses));
            x.start("main").nl();
            int index = 0;
            int[] budget = {MAX_PICTURES};
            for (ModelResult m : result.models()) {
                new HtmlModel(x, m, maps.get(m), "m" + index++, budget).write();
            }
            x.end().nl();
            x.end().nl();
            x.end();
            return x.finish();
        } catch (XMLStreamException e) {
            throw new IllegalStateException("cannot write the HTML report", e);
        }
    }

    /** Draws the first {@link #MAX_PICTURES} pictures (document order) and puts them into the views. */
    private static void drawPictures(RunResult result, Map<ModelResult, Map<String, MapPicture>> maps, Path directory) {
        List<PictureRequest> requests = new ArrayList<>();
        for (Map<String, MapPicture> mm : maps.values()) {
            for (MapPicture p : mm.values()) {
                if (p.drawing() != null && requests.size() < MAX_PICTURES) {
                    requests.add(p.drawing());
                }
            }
        }
        if (requests.isEmpty() && directory == null) {
            return;
        }
        MappingConfig mc = result.config().mapping();
        Map<String, PictureFile> drawn = new PictureFiles(mc.cacheDirectory(), mc.threads()).draw(requests, directory);
        Map<PictureRequest, PictureFile> byRequest = new java.util.IdentityHashMap<>();
        for (PictureRequest r : requests) {
            byRequest.put(r, drawn.get(r.key()));
        }
        for (Map<String, MapPicture> mm : maps.values()) {
            mm.replaceAll((id, p) -> byRequest.containsKey(p.drawing()) ? p.withPicture(byRequest.get(p.drawing())) : p);
        }
    }

    private static void header(XmlOut x, RunResult result) throws XMLStreamException {
        Map<Severity, Integer> counts = result.countsBySeverity();
        boolean failed = !result.failing().isEmpty();
        x.start("header").nl();
        x.leaf("h1", null, "AtomLedger report").nl();
        x.start("p", "lead");
        x.leaf("span", "verdict " + (failed ? "failed" : "passed"), failed ? "FAILED" : "PASSED");
        x.text(" " + result.models().size() + " model(s), "
                + result.models().stream().mapToInt(m -> m.reactions().size()).sum() + " reactions; "
                + counts.get(Severity.ERROR) + " errors, " + counts.get(Severity.WARNING) + " warnings, "
                + counts.get(Severity.INFO) + " info"
                + (result.config().failOn() == null ? "; findings never fail this run."
                : "; the run fails at " + result.config().failOn().label() + "."));
        x.end().nl();
        x.leaf("p", "caveat", "Balance and atom maps are computed from the formulas, charges and structures in "
                + "the model files. They point at likely curation errors; they do not replace expert review.").nl();
        x.end().nl();
    }

    private static void filterInputs(XmlOut x, String prefix, List<String> values) throws XMLStreamException {
        x.empty("input").attr("type", "radio").attr("name", prefix).attr("id", prefix + "-all")
                .attr("class", "radio").attr("checked", "checked").nl();
        for (String v : values) {
            x.empty("input").attr("type", "radio").attr("name", prefix).attr("id", prefix + "-" + v)
                    .attr("class", "radio").nl();
        }
    }

    private static void nav(XmlOut x, List<String> severities, List<String> rules, List<String> statuses)
            throws XMLStreamException {
        x.start("nav", "filters").attr("aria-label", "filters").nl();
        navGroup(x, "severity", "sev", severities, severities);
        navGroup(x, "rule", "rule", rules.stream().map(HtmlReporter::token).toList(), rules);
        navGroup(x, "map status", "st", statuses, statuses);
        x.start("div", "group");
        x.start("label").attr("for", "show-idx").text("atom indices").end();
        x.end().nl();
        x.end().nl();
    }

    private static void navGroup(XmlOut x, String title, String prefix, List<String> tokens, List<String> labels)
            throws XMLStreamException {
        x.start("div", "group");
        x.leaf("span", "gname", title);
        x.start("label").attr("for", prefix + "-all").text("all").end();
        for (int i = 0; i < tokens.size(); i++) {
            x.start("label").attr("for", prefix + "-" + tokens.get(i)).text(labels.get(i)).end();
        }
        x.end().nl();
    }

    /** A rule id as a CSS class/id token: {@code balance.charge} becomes {@code balance_charge}. */
    static String token(String ruleId) {
        return ruleId.replaceAll("[^A-Za-z0-9-]", "_");
    }

    /** The filter classes of an element with these findings. */
    static String filterClasses(List<Finding> findings) {
        Severity worst = Families.worst(findings);
        StringBuilder sb = new StringBuilder("sev-").append(worst == null ? "clean" : worst.label());
        new TreeSet<>(findings.stream().map(Finding::ruleId).toList())
                .forEach(r -> sb.append(" rule-").append(token(r)));
        return sb.toString();
    }

    static Map<String, Long> countBy(List<String> keys) {
        Map<String, Long> out = new TreeMap<>();
        keys.forEach(k -> out.merge(k, 1L, Long::sum));
        return out;
    }
}
