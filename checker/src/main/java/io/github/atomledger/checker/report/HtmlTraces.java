package io.github.atomledger.checker.report;

import io.github.atomledger.checker.check.structure.SpeciesStructures;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.trace.CarbonStatus;
import io.github.atomledger.checker.trace.CarbonTrace;
import io.github.atomledger.checker.trace.FateOutcome;
import io.github.atomledger.checker.trace.LabelReach;
import io.github.atomledger.checker.trace.PathwayTrace;
import io.github.atomledger.checker.trace.PositionText;
import io.github.atomledger.checker.trace.StepUse;
import io.github.atomledger.atommapper.depict.TracedStepPicture;

import java.awt.Color;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import javax.xml.stream.XMLStreamException;

/**
 * A model's carbon traces in the HTML report: per pathway its steps drawn in order (each source
 * carbon keeps one colour and its label from the first step to its fate, carbons not followed are
 * muted) beside a table of fates with the declared expectations; then, per label source, where
 * label can go. Pathways fold (the first one and failing ones open). A drawing that fails is named in
 * the page and the report goes on.
 */
final class HtmlTraces {

    /** The most steps drawn per model (each some 20 kB of SVG); later steps are listed without drawing. */
    static final int MAX_STEP_PICTURES = 300;
    /** The most reachable positions listed per label source; reachability.json has them all. */
    static final int MAX_REACH_ROWS = 300;

    /** Styles of this section (no '<', '>' or '&': the stylesheet is raw text in the page). */
    static final String STYLE = """
            section.traces{margin:14px 0 22px}
            section.traces h3{font-size:16px;margin:12px 0 4px}
            details.pathway{background:#fff;border:1px solid var(--line);border-left:6px solid var(--info);border-radius:3px;margin:10px 0;padding:8px 14px}
            details.pathway.fails{border-left-color:var(--err)}
            details.pathway summary{color:var(--ink);font-size:14px}
            details.pathway h4{margin:0 0 2px;font-size:15px;display:inline-flex;flex-wrap:wrap;gap:8px;align-items:baseline}
            .tlayout{display:grid;grid-template-columns:minmax(0,1fr) minmax(280px,36%);gap:16px;align-items:start}
            ol.tsteps{margin:4px 0;padding-left:24px}
            ol.tsteps li{margin:4px 0 10px}
            .thead{font-size:13px}
            .moves{color:var(--mute);font-size:12px}
            figure.tpic{margin:2px 0;overflow-x:auto}
            figure.tpic svg{max-width:100%;height:auto;background:#fff}
            .tfates{position:sticky;top:52px}
            .sw{display:inline-block;width:11px;height:11px;border-radius:6px;margin-right:5px;vertical-align:-1px}
            .v-holds{color:#00704f;font-weight:600}.v-differs{color:var(--err);font-weight:700}.v-undecided,.v-invalid{color:#8a5a00;font-weight:700}
            .st-undecided{color:#8a5a00}.st-split{color:var(--mute)}
            """;

    /** The severity and rule filters apply to pathways as to reaction cards (by their trace findings). */
    static String filters(List<String> severities, List<String> rules) {
        StringBuilder css = new StringBuilder();
        for (String prefix : new String[] {"sev", "rule"}) {
            for (String v : prefix.equals("sev") ? severities : rules) {
                String id = prefix + "-" + v;
                css.append("#").append(id).append(":checked ~ main details.pathway:not(.").append(id).append("){display:none}\n");
            }
        }
        return css.toString();
    }

    private final XmlOut x;
    private final ModelResult m;
    private final String idPrefix;
    private final int[] budget;
    private int open;

    HtmlTraces(XmlOut x, ModelResult m, String idPrefix, int[] budget) {
        this.x = x;
        this.m = m;
        this.idPrefix = idPrefix;
        this.budget = budget;
    }

    void write() throws XMLStreamException {
        if (m.traces().isEmpty()) {
            return;
        }
        x.start("section", "traces").attr("id", idPrefix + "-traces").nl();
        if (!m.traces().pathways().isEmpty()) {
            x.leaf("h3", null, "Carbon traces").nl();
            x.leaf("p", "caveat", "Each source carbon is followed through the model's own atom maps (curated maps where the"
                    + " model has them). A minimum-edit map is a chemical criterion, not the enzyme's mechanism; a trace"
                    + " is evidence for review, not proof of the biology.").nl();
        }
        int index = 0;
        for (PathwayTrace t : m.traces().pathways()) {
            pathway(t, idPrefix + "-pw" + index++);
        }
        if (!m.traces().reach().isEmpty()) {
            x.leaf("h3", null, "Where label can go").nl();
            for (LabelReach r : m.traces().reach()) {
                reach(r);
            }
        }
        x.end().nl();
    }

    private void pathway(PathwayTrace t, String id) throws XMLStreamException {
        List<FateOutcome> outcomes = m.traces().outcomes(t.pathway().name());
        boolean fails = !t.problems().isEmpty() || outcomes.stream().anyMatch(o -> o.verdict() != FateOutcome.Verdict.HOLDS);
        List<io.github.atomledger.checker.check.Finding> findings = m.modelFindings().stream()
                .filter(TraceConsole::isTrace).filter(f -> t.pathway().name().equals(f.data().get("pathway"))).toList();
        x.start("details", "pathway " + HtmlReporter.filterClasses(findings) + (fails ? " fails" : "")).attr("id", id);
        // The first pathway and every failing one are open; the others fold, so the reaction cards stay near.
        if (fails || open == 0) {
            x.attr("open", "open");
        }
        open++;
        x.nl().start("summary").start("h4").text("Pathway " + t.pathway().name());
        x.text(" ").leaf("span", "tag", "source " + t.pathway().source() + " (" + TraceSummary.name(m.model(), t.pathway().source()) + ")");
        x.text(" ").leaf("span", "tag", t.pathway().steps().size() + " steps");
        x.text(" ").leaf("span", "tag", t.pathway().where());
        x.end();
        x.leaf("p", "sub", TraceSummary.line(m.model(), m.traces(), t)).end().nl();
        Map<Integer, Integer> keys = TracePictures.keys(m, t);
        x.start("div", "tlayout").nl();
        x.start("ol", "tsteps").nl();
        for (int i = 1; i <= t.steps().size(); i++) {
            step(t, i, keys, id);
        }
        x.end().nl();
        fates(t, keys, outcomes);
        x.end().nl();
        x.end().nl();
    }

    private void step(PathwayTrace t, int i, Map<Integer, Integer> keys, String id) throws XMLStreamException {
        StepUse use = t.steps().get(i - 1);
        SpeciesStructures s = m.mapping().structures();
        x.start("li").nl();
        x.start("div", "thead").leaf("span", "rid", use.step().text());
        m.model().reactions().stream().filter(r -> r.id().equals(use.step().reactionId())).findFirst()
                .ifPresent(r -> safeText((r.name().equals(r.id()) ? "" : " " + r.name())
                        + (use.step().backwards() ? " (run backwards)" : "")));
        if (use.curated()) {
            x.text(" ").leaf("span", "tag", "curated map");
        }
        Optional<String> equation = equation(use);
        if (equation.isPresent()) {
            x.text(" ").leaf("span", "moves", "(" + equation.get() + ")");
        }
        List<String> moved = keys.keySet().stream().map(t::carbon).filter(c -> c.path().stream().anyMatch(h -> h.index() == i))
                .map(c -> s.label(t.pathway().source(), c.atom())).toList();
        List<String> stopped = keys.keySet().stream().map(t::carbon).filter(c -> c.stopStep() == i)
                .map(c -> s.label(t.pathway().source(), c.atom())).toList();
        x.text(" ").leaf("span", "moves", (moved.isEmpty() ? stopped.isEmpty() ? "moves no followed carbon" : ""
                : "moves " + String.join(" ", moved)) + (stopped.isEmpty() ? "" : (moved.isEmpty() ? "" : "; ")
                + "leaves " + String.join(" ", stopped) + " undecided"));
        x.end().nl();
        if (use.unusable() != null) {
            x.leaf("p", "nomap", "Not drawn: " + use.step().reactionId() + " " + use.unusable() + ".").nl();
        } else if (budget[0] <= 0) {
            x.leaf("p", "nomap", "Not drawn: the report already holds " + MAX_STEP_PICTURES + " step drawings.").nl();
        } else {
            try {
                Optional<String> svg = TracePictures.svg(m, t, i, keys);
                if (svg.isPresent()) {
                    budget[0]--;
                    x.start("figure", "tpic");
                    SvgEmbed.copy(svg.get(), id + "-s" + i + "-", x.writer());
                    x.end().nl();
                } else if (moved.isEmpty() && stopped.isEmpty()) {
                    x.leaf("p", "nomap", "Not drawn: no followed carbon passes this step.").nl();
                } else {
                    x.leaf("p", "nomap", "Not drawn: a structure of this step is missing.").nl();
                }
            } catch (RuntimeException | XMLStreamException e) {
                x.leaf("p", "nomap", "Not drawn: the drawing of " + use.step().reactionId() + " failed ("
                        + e.getMessage() + ").").nl();
            }
        }
        x.end().nl();
    }

    /** The reaction as written, by species names: {@code L-leucine + 2-oxoglutarate → ...}. */
    private Optional<String> equation(StepUse use) {
        return m.model().reactions().stream().filter(r -> r.id().equals(use.step().reactionId())).findFirst()
                .map(r -> String.join(" + ", r.reactants().stream().map(p -> TraceSummary.name(m.model(), p.species())).toList())
                        + (r.reversible() ? " \u21cc " : " \u2192 ")
                        + String.join(" + ", r.products().stream().map(p -> TraceSummary.name(m.model(), p.species())).toList()));
    }

    private void safeText(String text) {
        try {
            x.text(text);
        } catch (XMLStreamException e) {
            throw new IllegalStateException(e);
        }
    }

    private void fates(PathwayTrace t, Map<Integer, Integer> keys, List<FateOutcome> outcomes) throws XMLStreamException {
        SpeciesStructures s = m.mapping().structures();
        String source = t.pathway().source();
        Map<String, FateOutcome> byCarbon = new HashMap<>();
        outcomes.forEach(o -> byCarbon.putIfAbsent(o.carbon(), o));
        x.start("div", "tfates").nl();
        x.start("table", "fates").nl();
        x.start("tr").leaf("th", null, "carbon").leaf("th", null, "ends in").leaf("th", null, "status")
                .leaf("th", null, "last step").leaf("th", null, "expected").end().nl();
        for (Map.Entry<Integer, Integer> e : keys.entrySet()) {
            CarbonTrace c = t.carbon(e.getKey());
            String label = s.label(source, c.atom());
            x.start("tr");
            x.start("td").start("span", "sw").attr("style", "background:" + hex(TracedStepPicture.colour(e.getValue())))
                    .attr("title", "colour of " + label).end().text(label).end();
            x.leaf("td", null, c.status() == CarbonStatus.UNDECIDED ? "undecided"
                    : PositionText.of(s, c.positions().keySet()) + c.fateSpecies().map(f -> " (" + TraceSummary.name(m.model(), f) + ")").orElse(""));
            x.start("td", "st-" + c.status().label());
            if (!c.reason().isEmpty()) {
                x.attr("title", c.reason());
            }
            x.text(c.status().label()).end();
            int step = c.status() == CarbonStatus.UNDECIDED ? c.stopStep() : c.lastMove();
            x.leaf("td", "rid", step == 0 ? "" : step + ". " + t.pathway().steps().get(step - 1).text());
            FateOutcome o = byCarbon.get(label);
            if (o == null) {
                x.leaf("td", null, "");
            } else {
                x.start("td");
                if (o.verdict() != FateOutcome.Verdict.HOLDS) {
                    x.attr("title", o.detail().isEmpty() ? "ends in " + o.actual() : o.detail());
                }
                x.text(o.expectation().fateText() + " ").leaf("span", "v-" + o.verdict().label(), o.verdict().label()).end();
            }
            x.end().nl();
        }
        x.end().nl();
        for (FateOutcome o : outcomes) {
            if (o.verdict() == FateOutcome.Verdict.INVALID) {
                x.leaf("p", "nomap", o.expectation().where() + ": " + o.detail() + ".").nl();
            }
        }
        if (t.carbons().isEmpty()) {
            x.leaf("p", "nomap", "Not traced: " + String.join("; ", t.problems()) + ".").nl();
        }
        x.end().nl();
    }

    private void reach(LabelReach r) throws XMLStreamException {
        SpeciesStructures s = m.mapping().structures();
        long species = r.reached().stream().map(p -> p.position().species()).distinct().count();
        x.start("details", "reach").nl();
        x.leaf("summary", null, "Label from " + PositionText.of(s, List.of(r.source())) + " can reach " + r.reached().size()
                + " positions in " + species + " species").nl();
        x.start("table").nl();
        x.start("tr").leaf("th", null, "position").leaf("th", null, "species").leaf("th", "n", "steps")
                .leaf("th", null, "shortest chain of reactions").end().nl();
        int rows = 0;
        for (LabelReach.Reached p : r.reached()) {
            if (rows++ >= MAX_REACH_ROWS) {
                x.start("tr").leaf("td", null, "... and " + (r.reached().size() - MAX_REACH_ROWS)
                        + " more in reachability.json").end().nl();
                break;
            }
            x.start("tr").leaf("td", "rid", PositionText.of(s, List.of(p.position())))
                    .leaf("td", null, TraceSummary.name(m.model(), p.position().species()))
                    .leaf("td", "n", Integer.toString(p.chain().size()))
                    .leaf("td", "rid", String.join(" ", p.chain().stream().map(st -> st.text()).toList())).end().nl();
        }
        x.end().nl();
        x.end().nl();
    }

    private static String hex(Color c) {
        return String.format(Locale.ROOT, "#%02X%02X%02X", c.getRed(), c.getGreen(), c.getBlue());
    }
}
