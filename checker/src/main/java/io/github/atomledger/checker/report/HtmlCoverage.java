package io.github.atomledger.checker.report;

import io.github.atomledger.checker.check.mapping.Coverage;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;

import java.util.Map;
import java.util.stream.Collectors;
import javax.xml.stream.XMLStreamException;

/**
 * The structure coverage of one model in the HTML report (issue 15): a card with the counts, and
 * below the cards the missing structures ranked by how many reactions each would unblock, and the
 * generic and polymer species, which are not missing but have no single structure.
 */
final class HtmlCoverage {

    /** Rows of the ranked list shown before the rest is folded into a count. */
    static final int SHOWN = 30;

    private final XmlOut x;
    private final Coverage c;

    HtmlCoverage(XmlOut x, ModelResult m) {
        this.x = x;
        Map<String, ReactionResult> byId = m.reactions().stream()
                .collect(Collectors.toMap(ReactionResult::id, r -> r, (a, b) -> a));
        this.c = m.mapping().enabled() ? Coverage.of(m.model(), m.mapping(), id -> byId.get(id).reactionClass()) : null;
    }

    void card() throws XMLStreamException {
        if (c == null) {
            return;
        }
        x.start("div", "card").leaf("h3", null, "structure coverage");
        x.leaf("p", "sub", c.mappable() + " of " + c.considered() + " mappable-class reactions have every structure");
        x.start("table");
        row("missing structures", c.missing().size());
        row("reactions they block", c.blocked() - c.blockedByGenericOnly());
        row("generic or polymer species", c.generic().size());
        row("reactions waiting only on those", c.blockedByGenericOnly());
        for (Map.Entry<String, Integer> e : c.sources().entrySet()) {
            row("structures from " + e.getKey(), e.getValue());
        }
        x.end();
        x.end().nl();
    }

    void details() throws XMLStreamException {
        if (c == null || (c.missing().isEmpty() && c.generic().isEmpty())) {
            return;
        }
        x.start("details", "coverage");
        if (c.missing().size() + c.generic().size() <= SHOWN) {
            x.attr("open", "open");
        }
        x.leaf("summary", null, c.missing().size() + " missing structure(s), ranked by the reactions each would unblock; "
                + c.generic().size() + " generic or polymer species").nl();
        if (!c.missing().isEmpty()) {
            x.start("table").nl();
            x.start("tr").leaf("th", "n", "rank").leaf("th", null, "species").leaf("th", "n", "unblocks alone")
                    .leaf("th", "n", "in reactions").leaf("th", null, "reactions").end().nl();
            int rank = 0;
            for (Coverage.Missing m : c.missing()) {
                if (++rank > SHOWN) {
                    break;
                }
                x.start("tr").leaf("td", "n", Integer.toString(rank)).leaf("td", "rid", m.species())
                        .leaf("td", "n", Integer.toString(m.unblocks())).leaf("td", "n", Integer.toString(m.blocks()))
                        .leaf("td", "rid", String.join(" ", m.reactions().stream().limit(8).toList())
                                + (m.reactions().size() > 8 ? " ..." : "")).end().nl();
            }
            x.end().nl();
            if (c.missing().size() > SHOWN) {
                x.leaf("p", "sub", (c.missing().size() - SHOWN) + " more in the report.json finding mapping.structure-missing").nl();
            }
        }
        if (!c.generic().isEmpty()) {
            x.start("table").nl();
            x.start("tr").leaf("th", null, "generic species").leaf("th", null, "why").leaf("th", "n", "reactions waiting")
                    .end().nl();
            for (Coverage.Generic g : c.generic()) {
                x.start("tr").leaf("td", "rid", g.species()).leaf("td", null, g.reason())
                        .leaf("td", "n", Integer.toString(g.blocks())).end().nl();
            }
            x.end().nl();
        }
        x.end().nl();
    }

    private void row(String label, long n) throws XMLStreamException {
        x.start("tr").leaf("td", null, label).leaf("td", "n", Long.toString(n)).end();
    }
}
