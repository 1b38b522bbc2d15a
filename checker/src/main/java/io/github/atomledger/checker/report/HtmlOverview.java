package io.github.atomledger.checker.report;

import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.engine.BaselineStatus;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.RunResult;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import javax.xml.stream.XMLStreamException;

/**
 * The top of the HTML report, what a curator reads first: the likely common causes, then what
 * fails the build (grouped by rule), then the warnings, each line linking to its reaction card or
 * finding row; info findings collapsed. Each line says what and why in words ({@link FindingWords}).
 */
final class HtmlOverview implements HtmlSection {

    /** Lines shown per failing rule before the rest folds into "and N more". */
    static final int SHOWN_FAILING = 12;

    /** Lines shown per warning rule before the rest folds away. */
    static final int SHOWN_WARNING = 4;

    /** One finding with the model it belongs to and the anchor of its card or row. */
    private record Item(Finding finding, ModelResult model, String anchor) {
    }

    @Override
    public void write(XmlOut x, RunResult result, Map<ModelResult, String> prefixes) throws XMLStreamException {
        Severity threshold = Families.threshold(result);
        List<Item> causes = new ArrayList<>();
        Map<String, List<Item>> failing = new TreeMap<>();
        Map<String, List<Item>> warnings = new TreeMap<>();
        Map<String, List<Item>> info = new TreeMap<>();
        Map<String, String> explained = new TreeMap<>();
        int accepted = 0;
        for (ModelResult m : result.models()) {
            List<Finding> all = m.allFindings();
            FindingWords.explainedBy(all, m).forEach((r, who) -> explained.put(prefixes.get(m) + "/" + r, who));
            for (Finding f : all) {
                Item item = new Item(f, m, HtmlReporter.anchor(prefixes.get(m), m, f));
                boolean fails = result.config().failOn() != null && f.severity().atLeast(threshold) && result.gate().mayFail(f);
                if (!fails && result.gate().status(f).filter(s -> s == BaselineStatus.ACCEPTED).isPresent()) {
                    accepted++;
                    info.computeIfAbsent(f.ruleId(), k -> new ArrayList<>()).add(item);
                } else if (f.ruleId().equals("balance.common-cause")) {
                    causes.add(item);
                } else if (fails) {
                    failing.computeIfAbsent(f.ruleId(), k -> new ArrayList<>()).add(item);
                } else if (f.severity() == Severity.INFO) {
                    info.computeIfAbsent(f.ruleId(), k -> new ArrayList<>()).add(item);
                } else {
                    warnings.computeIfAbsent(f.ruleId(), k -> new ArrayList<>()).add(item);
                }
            }
        }
        x.start("section", "overview").attr("id", "problems").attr("aria-label", "problems").nl();
        if (!causes.isEmpty()) {
            x.start("div", "causes").nl();
            x.leaf("h2", null, causes.size() == 1 ? "Likely cause" : "Likely causes").nl();
            for (Item c : causes) {
                cause(x, c, prefixes.get(c.model()));
            }
            x.end().nl();
        }
        int failingCount = failing.values().stream().mapToInt(List::size).sum();
        if (failingCount > 0) {
            x.leaf("h2", "fails", (threshold == Severity.ERROR ? Wording.count(failingCount, "error")
                    : Wording.count(failingCount, "finding") + " at " + threshold.label() + " or above")
                    + (failingCount == 1 ? " fails" : " fail") + " the build").nl();
            for (Map.Entry<String, List<Item>> e : failing.entrySet()) {
                group(x, e.getKey(), e.getValue(), SHOWN_FAILING, explained, prefixes, true);
            }
        } else {
            x.leaf("h2", "passes", result.config().failOn() == null ? "Findings never fail this run"
                    : "Nothing fails the build").nl();
        }
        int warningCount = warnings.values().stream().mapToInt(List::size).sum();
        if (warningCount > 0) {
            x.leaf("h2", null, causes.isEmpty() ? Wording.count(warningCount, "warning")
                    : Wording.count(warningCount, "further warning")).nl();
            for (Map.Entry<String, List<Item>> e : warnings.entrySet()) {
                group(x, e.getKey(), e.getValue(), SHOWN_WARNING, explained, prefixes, false);
            }
        }
        int infoCount = info.values().stream().mapToInt(List::size).sum();
        if (infoCount > 0) {
            x.start("details", "info-list").nl();
            x.leaf("summary", null, Wording.count(infoCount, "further finding") + " for information"
                    + (accepted > 0 ? " (" + accepted + " accepted by the baseline)" : "")).nl();
            for (Map.Entry<String, List<Item>> e : info.entrySet()) {
                group(x, e.getKey(), e.getValue(), 0, explained, prefixes, false);
            }
            x.end().nl();
        }
        x.end().nl();
    }

    private static void cause(XmlOut x, Item c, String prefix) throws XMLStreamException {
        Finding f = c.finding();
        x.start("p", "cause").leaf("span", "sev " + f.severity().label(), "likely cause").text(" ");
        x.start("a").attr("href", "#" + c.anchor()).text(FindingWords.subject(f, c.model())).end();
        x.text(": " + f.message());
        x.end().nl();
        String reactions = f.data().get("reactions");
        if (reactions != null && !reactions.isEmpty()) {
            x.start("p", "links").text("Explains: ");
            boolean first = true;
            for (String r : reactions.split(",")) {
                if (!first) {
                    x.text(", ");
                }
                first = false;
                x.start("a").attr("href", "#" + prefix + "-" + HtmlReporter.token(r)).text(r).end();
            }
            x.end().nl();
        }
    }

    private static void group(XmlOut x, String rule, List<Item> items, int shown, Map<String, String> explained,
                              Map<ModelResult, String> prefixes, boolean failing) throws XMLStreamException {
        Severity sev = items.get(0).finding().severity();
        x.start("div", "group " + (failing ? "failing" : sev.label())).nl();
        x.start("h3").leaf("span", "rule", rule).text(" ").leaf("span", "count", "(" + items.size() + ")");
        String about = FindingWords.description(rule).orElse("");
        if (!about.isEmpty()) {
            x.text(" " + about);
        }
        x.end().nl();
        if (shown > 0) {
            list(x, items.subList(0, Math.min(shown, items.size())), explained, prefixes);
        }
        if (items.size() > shown) {
            x.start("details", "more").nl();
            x.leaf("summary", null, shown == 0 ? "show " + Wording.count(items.size(), "finding")
                    : "and " + (items.size() - shown) + " more").nl();
            list(x, items.subList(shown, items.size()), explained, prefixes);
            x.end().nl();
        }
        x.end().nl();
    }

    private static void list(XmlOut x, List<Item> items, Map<String, String> explained, Map<ModelResult, String> prefixes)
            throws XMLStreamException {
        x.start("ul", "problems").nl();
        for (Item i : items) {
            Finding f = i.finding();
            x.start("li", "sev-" + f.severity().label());
            x.start("a").attr("href", "#" + i.anchor()).text(FindingWords.subject(f, i.model())).end();
            x.text(": " + FindingWords.reason(f) + FindingWords.unknownElements(f, i.model()));
            String who = explained.get(prefixes.get(i.model()) + "/" + f.elementId());
            if (who != null && f.ruleId().startsWith("balance.")) {
                x.text(" ").leaf("span", "tag", "likely cause: " + who);
            }
            x.end().nl();
        }
        x.end().nl();
    }
}
