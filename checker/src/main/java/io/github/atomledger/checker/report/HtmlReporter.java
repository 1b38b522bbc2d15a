package io.github.atomledger.checker.report;

import io.github.atomledger.checker.engine.ReportFormat;
import io.github.atomledger.checker.Version;
import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.MappingConfig;
import io.github.atomledger.checker.engine.ReactionResult;
import io.github.atomledger.checker.engine.RunResult;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.IdentityHashMap;
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
 * nothing fetched from the network) that opens offline, with each atom-map drawing an SVG file in
 * {@code pictures/} that the page loads lazily (so a genome-scale report opens at once; see
 * DEVELOPERS.md for the measurement behind this). Problems first: the header with the verdict,
 * then the overview ({@link HtmlOverview}: likely causes, what fails the build, warnings, each
 * linking to its card; info collapsed), then any further run-level {@link #SECTIONS}, the filters,
 * and per model a summary (reactions by class, findings by severity, the balance counts of
 * {@link ModelCounts}, mapping status when mapping data is present, findings on species and the
 * model) and one card per reaction, failing ones first: the equation with species names and ids,
 * the balance table, the findings, the fix hint from the finding data ({@code fix.*}) and, when
 * the {@link MappingSource} has one, the drawing of the atom map. Filters by severity, rule and
 * mapping status work without scripts and offer only values that occur.
 *
 * <p>Markup is written with {@code XMLStreamWriter} (serialised as HTML5-compatible XML: every
 * non-void element has an end tag), so the file is also well-formed XML. Same result, same bytes.
 */
public final class HtmlReporter implements Reporter {

    static final String NO_MAP = "no-map";

    /**
     * Run-level sections between the header and the filters, in order; another feature's section
     * (pathways, coverage) is one more entry here.
     */
    static final List<HtmlSection> SECTIONS = List.of(new HtmlOverview());

    /**
     * The most drawings one report holds (each an SVG file of some 10 to 150 kB, drawn once and
     * then cached); later ones (in the order of the cards, failing ones first) are left out.
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
            // Keyed by identity: a ModelResult is a record whose hash walks the whole model (every
            // reaction, map and finding), which on a genome-scale model costs milliseconds per lookup.
            Map<ModelResult, Map<String, MapPicture>> maps = new IdentityHashMap<>();
            Map<ModelResult, String> prefixes = new IdentityHashMap<>();
            TreeSet<String> rules = new TreeSet<>();
            TreeSet<String> statuses = new TreeSet<>();
            TreeSet<String> severities = new TreeSet<>();
            boolean mapped = false;
            for (ModelResult m : result.models()) {
                prefixes.put(m, "m" + prefixes.size());
                Map<String, MapPicture> mm = new LinkedHashMap<>();
                for (ReactionResult r : m.reactions()) {
                    Optional<MapPicture> rm = mappings.mapping(m, r);
                    rm.ifPresent(x -> mm.put(r.id(), x));
                    statuses.add(rm.map(MapPicture::status).orElse(NO_MAP));
                    Severity worst = Families.worst(r.findings());
                    severities.add(worst == null ? "clean" : worst.label());
                }
                mapped |= !mm.isEmpty();
                maps.put(m, mm);
                m.allFindings().forEach(f -> rules.add(f.ruleId()));
                m.modelFindings().forEach(f -> severities.add(f.severity().label()));
            }
            drawPictures(result, maps, directory);
            List<String> severityTokens = SEVERITY_ORDER.stream().filter(severities::contains).toList();
            List<String> ruleTokens = rules.stream().map(HtmlReporter::token).toList();
            List<String> statusTokens = mapped ? new ArrayList<>(statuses) : List.of();

            XmlOut x = new XmlOut();
            x.doctype("<!DOCTYPE html>");
            x.start("html").attr("lang", "en").nl();
            x.start("head").nl();
            x.empty("meta").attr("charset", "utf-8").nl();
            x.empty("meta").attr("name", "viewport").attr("content", "width=device-width, initial-scale=1").nl();
            x.empty("meta").attr("name", "generator").attr("content", "AtomLedger " + Version.get()).nl();
            x.leaf("title", null, "AtomLedger report").nl();
            x.start("style").text(HtmlStyle.BASE).text(HtmlTraces.STYLE)
                    .text(HtmlStyle.filters(severityTokens, ruleTokens, statusTokens))
                    .text(HtmlTraces.filters(severityTokens, ruleTokens)).end().nl();
            x.end().nl();
            x.start("body").nl();
            header(x, result);
            for (HtmlSection section : SECTIONS) {
                section.write(x, result, prefixes);
            }
            filterInputs(x, "sev", severityTokens);
            filterInputs(x, "rule", ruleTokens);
            if (!statusTokens.isEmpty()) {
                filterInputs(x, "st", statusTokens);
                x.empty("input").attr("type", "checkbox").attr("id", "show-idx").attr("class", "radio").nl();
            }
            nav(x, severityTokens, new ArrayList<>(rules), statusTokens);
            x.start("main").nl();
            int[] budget = {MAX_PICTURES};
            for (ModelResult m : result.models()) {
                new HtmlModel(x, m, maps.get(m), prefixes.get(m), budget, result).write();
            }
            x.end().nl();
            x.end().nl();
            x.end();
            return x.finish();
        } catch (XMLStreamException e) {
            throw new IllegalStateException("cannot write the HTML report", e);
        }
    }

    private static final List<String> SEVERITY_ORDER = List.of("error", "warning", "info", "clean");

    /**
     * The id of the element a finding is shown on: its reaction card ({@code m0-R_PFK}), or its row
     * in the model's table of findings on species and the model ({@code m0-f3}).
     */
    static String anchor(String prefix, ModelResult m, Finding f) {
        List<Finding> rows = m.modelFindings();
        for (int i = 0; i < rows.size(); i++) {
            if (rows.get(i) == f) {
                return prefix + "-f" + i;
            }
        }
        return prefix + "-" + token(f.elementId());
    }

    /**
     * Draws the first {@link #MAX_PICTURES} pictures, in the order of the cards (so the pictures the
     * budget keeps are the ones the page shows), and puts them into the views.
     */
    private static void drawPictures(RunResult result, Map<ModelResult, Map<String, MapPicture>> maps, Path directory) {
        List<PictureRequest> requests = new ArrayList<>();
        for (ModelResult m : result.models()) {
            for (ReactionResult r : HtmlModel.ordered(m, result)) {
                MapPicture p = maps.get(m).get(r.id());
                if (p != null && p.drawing() != null && requests.size() < MAX_PICTURES) {
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
        x.text(" " + Wording.count(result.models().size(), "model") + ", "
                + Wording.count(result.models().stream().mapToInt(m -> m.reactions().size()).sum(), "reaction") + "; "
                + Wording.count(counts.get(Severity.ERROR), "error") + ", "
                + Wording.count(counts.get(Severity.WARNING), "warning") + ", " + counts.get(Severity.INFO) + " info"
                + (result.config().failOn() == null ? "; findings never fail this run."
                : "; the run fails at " + result.config().failOn().label() + "."));
        x.end().nl();
        for (ModelResult m : result.models()) {
            String why = ModelCounts.of(m).whyCharge();
            if (!why.isEmpty() && why.startsWith("no species")) {
                x.leaf("p", "lead-note", m.file() + ": charge balance not checked, " + why + ".").nl();
            }
        }
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
        x.leaf("span", "gname", "Show cards:");
        navGroup(x, "severity", "sev", severities, severities);
        navGroup(x, "rule", "rule", rules.stream().map(HtmlReporter::token).toList(), rules);
        if (!statuses.isEmpty()) {
            navGroup(x, "map status", "st", statuses, statuses);
            // every mapped atom's number in the drawings (coloured carbons always carry theirs)
            x.start("div", "group");
            x.start("label").attr("for", "show-idx").text("all atom numbers").end();
            x.end().nl();
        }
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
