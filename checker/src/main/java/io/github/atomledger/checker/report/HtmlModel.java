package io.github.atomledger.checker.report;

import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.balance.SpeciesChemistry;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;

import java.util.List;
import java.util.Map;
import javax.xml.stream.XMLStreamException;

/** One model's section of the HTML report: summary cards, model-level findings, reaction cards. */
final class HtmlModel {

    private final XmlOut x;
    private final ModelResult m;
    private final Map<String, MapPicture> maps;
    private final String idPrefix;
    private final int[] pictureBudget;
    private final int[] traceBudget = {HtmlTraces.MAX_STEP_PICTURES};

    HtmlModel(XmlOut x, ModelResult m, Map<String, MapPicture> maps, String idPrefix, int[] pictureBudget) {
        this.pictureBudget = pictureBudget;
        this.x = x;
        this.m = m;
        this.maps = maps;
        this.idPrefix = idPrefix;
    }

    void write() throws XMLStreamException {
        x.start("section", "model").attr("id", idPrefix).nl();
        x.start("h2").text(m.file());
        if (!m.model().modelId().isEmpty()) {
            x.text(" ").leaf("span", "tag", m.model().modelId());
        }
        x.text(" ").leaf("span", "tag", "SBML L" + m.model().level() + "V" + m.model().version()
                + (m.model().fbcVersion() > 0 ? " fbc v" + m.model().fbcVersion() : ""));
        x.end().nl();
        HtmlCoverage coverage = new HtmlCoverage(x, m);
        cards(coverage);
        coverage.details();
        modelFindings();
        new HtmlTraces(x, m, idPrefix, traceBudget).write();
        Map<String, SpeciesChemistry> chemistry = BalanceTable.chemistry(m.model());
        for (ReactionResult r : m.reactions()) {
            MapPicture map = maps.get(r.id());
            boolean drawn = map != null && map.drawing() != null && pictureBudget[0] > 0;
            if (drawn) {
                pictureBudget[0]--;
            }
            new HtmlReaction(x, m, r, map, chemistry, idPrefix, drawn).write();
        }
        x.end().nl();
    }

    private void cards(HtmlCoverage coverage) throws XMLStreamException {
        List<Finding> all = m.allFindings();
        x.start("div", "cards").nl();

        x.start("div", "card").leaf("h3", null, "reactions by class");
        Map<String, Long> classes = HtmlReporter.countBy(m.reactions().stream().map(r -> r.reactionClass().label()).toList());
        table(classes, m.reactions().size() + " reactions, " + m.model().species().size() + " species");
        x.end().nl();

        x.start("div", "card").leaf("h3", null, "findings by severity");
        x.start("table");
        for (Severity s : new Severity[] {Severity.ERROR, Severity.WARNING, Severity.INFO}) {
            x.start("tr").start("td").leaf("span", "sev " + s.label(), s.label()).end()
                    .leaf("td", "n", Long.toString(all.stream().filter(f -> f.severity() == s).count())).end();
        }
        x.end();
        x.end().nl();

        x.start("div", "card").leaf("h3", null, "balance");
        x.start("table");
        row("element-imbalanced", ModelCounts.elementImbalanced(m));
        row("charge-imbalanced", ModelCounts.chargeImbalanced(m));
        row("not computable", m.reactions().stream().filter(r -> r.reactionClass().balanceComputed()
                && !r.balance().elementsComputable()).count());
        row("not checked (class)", m.reactions().stream().filter(r -> !r.reactionClass().balanceComputed()).count());
        x.end();
        x.end().nl();

        if (!maps.isEmpty()) {
            x.start("div", "card").leaf("h3", null, "atom maps");
            Map<String, Long> st = HtmlReporter.countBy(m.reactions().stream()
                    .map(r -> maps.containsKey(r.id()) ? maps.get(r.id()).status() : HtmlReporter.NO_MAP).toList());
            table(st, null);
            x.end().nl();
        }

        coverage.card();

        x.start("div", "card").leaf("h3", null, "findings by rule");
        table(HtmlReporter.countBy(all.stream().map(Finding::ruleId).toList()), all.isEmpty() ? "none" : null);
        x.end().nl();
        x.end().nl();
    }

    private void table(Map<String, Long> counts, String caption) throws XMLStreamException {
        if (caption != null) {
            x.leaf("p", "sub", caption);
        }
        x.start("table");
        for (Map.Entry<String, Long> e : counts.entrySet()) {
            row(e.getKey(), e.getValue());
        }
        x.end();
    }

    private void row(String label, long n) throws XMLStreamException {
        x.start("tr").leaf("td", null, label).leaf("td", "n", Long.toString(n)).end();
    }

    private void modelFindings() throws XMLStreamException {
        if (m.modelFindings().isEmpty()) {
            return;
        }
        x.start("details", "model-findings").attr("open", "open");
        x.leaf("summary", null, m.modelFindings().size() + " finding(s) on species and the model").nl();
        x.start("table").nl();
        x.start("tr").leaf("th", null, "severity").leaf("th", null, "element").leaf("th", null, "line")
                .leaf("th", null, "rule").leaf("th", null, "message").end().nl();
        for (Finding f : m.modelFindings()) {
            x.start("tr", "mf " + HtmlReporter.filterClasses(List.of(f)));
            x.start("td").leaf("span", "sev " + f.severity().label(), f.severity().label()).end();
            x.leaf("td", "rid", f.elementId());
            x.leaf("td", "n", f.line() > 0 ? Integer.toString(f.line()) : "");
            x.leaf("td", "rule", f.ruleId());
            x.leaf("td", null, f.message());
            x.end().nl();
        }
        x.end().nl();
        x.end().nl();
    }
}
