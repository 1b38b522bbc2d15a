package io.github.atomledger.checker.report;

import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.balance.SpeciesChemistry;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;
import io.github.atomledger.checker.engine.RunResult;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import javax.xml.stream.XMLStreamException;

/**
 * One model's section of the HTML report: summary cards, findings on species and the model (those
 * that matter open, info folded), then the reaction cards, those that fail the build first, then
 * by worst severity, in file order within each.
 */
final class HtmlModel {

    /** Per-model sections written after the summary cards; another feature's is one more entry here. */
    static final List<ModelSection> SECTIONS = List.of();

    /** A section of one model's part of the page (for example pathways or structure coverage). */
    interface ModelSection {
        void write(XmlOut x, ModelResult m, String idPrefix) throws XMLStreamException;
    }

    private final XmlOut x;
    private final ModelResult m;
    private final Map<String, MapPicture> maps;
    private final String idPrefix;
    private final int[] pictureBudget;
    private final RunResult run;
    private final int[] traceBudget = {HtmlTraces.MAX_STEP_PICTURES};

    HtmlModel(XmlOut x, ModelResult m, Map<String, MapPicture> maps, String idPrefix, int[] pictureBudget, RunResult run) {
        this.pictureBudget = pictureBudget;
        this.run = run;
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
        for (ModelSection section : SECTIONS) {
            section.write(x, m, idPrefix);
        }
        modelFindings();
        new HtmlTraces(x, m, idPrefix, traceBudget).write();
        Map<String, SpeciesChemistry> chemistry = BalanceTable.chemistry(m.model());
        for (ReactionResult r : ordered(m, run)) {
            MapPicture map = maps.get(r.id());
            boolean drawn = map != null && map.drawing() != null && pictureBudget[0] > 0;
            if (drawn) {
                pictureBudget[0]--;
            }
            new HtmlReaction(x, m, r, map, chemistry, idPrefix, drawn).write();
        }
        x.end().nl();
    }

    /**
     * Failing cards first, then error, warning, imbalanced-at-info (biomass), other info and clean
     * ones; file order within each.
     */
    static List<ReactionResult> ordered(ModelResult m, RunResult run) {
        List<ReactionResult> out = new ArrayList<>(m.reactions());
        out.sort(Comparator.comparingInt(r -> rank(r, run)));
        return out;
    }

    private static int rank(ReactionResult r, RunResult run) {
        if (r.findings().stream().anyMatch(f -> fails(f, run))) {
            return 0;
        }
        Severity worst = Families.worst(r.findings());
        if (worst == null) {
            return 5;
        }
        if (worst == Severity.INFO) {
            // an imbalance reported at info (the biomass reaction) before exempt and other notes
            boolean off = r.reactionClass().balanceComputed()
                    && (r.balance().elementImbalanced() || r.balance().chargeImbalanced());
            return off ? 3 : 4;
        }
        return worst == Severity.ERROR ? 1 : 2;
    }

    private static boolean fails(Finding f, RunResult run) {
        return run.config().failOn() != null && f.severity().atLeast(run.config().failOn()) && run.gate().mayFail(f);
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
        ModelCounts counts = ModelCounts.of(m);
        x.leaf("p", "sub", Wording.count(counts.checked(), "reaction") + " checked, " + counts.notChecked()
                + " not (exchange, demand, sink)");
        x.start("table");
        x.start("tr").leaf("th", null, "").leaf("th", "n", "elements").leaf("th", "n", "charge").end();
        balanceRow("balanced", counts.elements().balanced(), counts.charge().balanced());
        balanceRow("imbalanced", counts.elements().imbalanced(), counts.charge().imbalanced());
        balanceRow("not computable", counts.elements().notComputable(), counts.charge().notComputable());
        x.end();
        for (String why : List.of(counts.whyElements(), counts.whyCharge())) {
            if (!why.isEmpty()) {
                x.leaf("p", "sub why", (why == counts.whyCharge() ? "charge: " : "elements: ") + why);
            }
        }
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

    private void balanceRow(String label, long elements, long charge) throws XMLStreamException {
        x.start("tr").leaf("td", null, label).leaf("td", "n", Long.toString(elements)).leaf("td", "n", Long.toString(charge))
                .end();
    }

    private void row(String label, long n) throws XMLStreamException {
        x.start("tr").leaf("td", null, label).leaf("td", "n", Long.toString(n)).end();
    }

    private void modelFindings() throws XMLStreamException {
        List<Finding> all = m.modelFindings();
        if (all.isEmpty()) {
            return;
        }
        List<Integer> important = new ArrayList<>();
        List<Integer> info = new ArrayList<>();
        for (int i = 0; i < all.size(); i++) {
            (all.get(i).severity() == Severity.INFO && !fails(all.get(i), run) ? info : important).add(i);
        }
        if (!important.isEmpty()) {
            findingTable(important, Wording.count(important.size(), "finding") + " on species, the model and the"
                    + " structure table", true);
        }
        if (!info.isEmpty()) {
            findingTable(info, Wording.count(info.size(), "further finding") + " on species and the model, for"
                    + " information", false);
        }
    }

    private void findingTable(List<Integer> rows, String title, boolean open) throws XMLStreamException {
        List<Finding> all = m.modelFindings();
        x.start("details", "model-findings");
        if (open) {
            x.attr("open", "open");
        }
        x.leaf("summary", null, title).nl();
        x.start("table").nl();
        x.start("tr").leaf("th", null, "severity").leaf("th", null, "element").leaf("th", null, "where")
                .leaf("th", null, "rule").leaf("th", null, "message").end().nl();
        for (int i : rows) {
            Finding f = all.get(i);
            x.start("tr", "mf " + HtmlReporter.filterClasses(List.of(f))).attr("id", idPrefix + "-f" + i);
            x.start("td").leaf("span", "sev " + f.severity().label(), f.severity().label()).end();
            x.start("td", "rid").text(f.elementId());
            String name = FindingWords.name(f.elementId(), m).orElse("");
            if (!name.isEmpty()) {
                x.text(" ").leaf("span", "rname", name);
            }
            x.end();
            x.leaf("td", "where", f.modelFile() + (f.line() > 0 ? ":" + f.line() : ""));
            x.leaf("td", "rule", f.ruleId());
            x.start("td").text(f.message());
            listedInData(f);
            x.end();
            x.end().nl();
        }
        x.end().nl();
        x.end().nl();
    }

    /** "+2" as "the structure has 2 protons more". */
    private static String protonWords(String signed) {
        long k = Long.parseLong(signed.replace("+", ""));
        return "the structure has " + Wording.count(Math.abs(k), "proton") + (k > 0 ? " more" : " fewer");
    }

    /** A finding that stands for many species (protonation) lists them all, folded. */
    private void listedInData(Finding f) throws XMLStreamException {
        String species = f.data().get("species");
        if (species == null || !species.contains(",")) {
            return;
        }
        String[] ids = species.split(",");
        String[] protons = f.data().getOrDefault("protons", "").split(",");
        x.start("details", "listed").leaf("summary", null, "all " + Wording.count(ids.length, "species"));
        x.start("ul", "listed");
        for (int i = 0; i < ids.length; i++) {
            String name = FindingWords.name(ids[i], m).map(n -> " " + n).orElse("");
            String k = protons.length == ids.length ? " (" + protonWords(protons[i]) + ")" : "";
            x.leaf("li", null, ids[i] + name + k);
        }
        x.end().end();
    }
}
