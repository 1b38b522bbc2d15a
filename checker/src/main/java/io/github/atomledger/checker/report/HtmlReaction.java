package io.github.atomledger.checker.report;

import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.balance.Deltas;
import io.github.atomledger.checker.check.balance.SpeciesChemistry;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;
import io.github.atomledger.checker.model.Participant;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.util.List;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;
import javax.xml.stream.XMLStreamException;

/** One reaction's card in the HTML report. */
final class HtmlReaction {

    private final XmlOut x;
    private final ModelResult m;
    private final ReactionResult r;
    private final MapPicture map;
    private final Map<String, SpeciesChemistry> chemistry;
    private final String idPrefix;
    private final boolean pictureAllowed;

    HtmlReaction(XmlOut x, ModelResult m, ReactionResult r, MapPicture map,
                 Map<String, SpeciesChemistry> chemistry, String idPrefix, boolean pictureAllowed) {
        this.pictureAllowed = pictureAllowed;
        this.x = x;
        this.m = m;
        this.r = r;
        this.map = map;
        this.chemistry = chemistry;
        this.idPrefix = idPrefix;
    }

    void write() throws XMLStreamException {
        String classes = "rxn " + HtmlReporter.filterClasses(r.findings()) + " st-"
                + (map == null ? HtmlReporter.NO_MAP : map.status());
        x.start("article", classes).attr("id", idPrefix + "-" + HtmlReporter.token(r.id())).nl();
        x.start("h4");
        x.leaf("span", "rid", r.id());
        if (!r.reaction().name().equals(r.id())) {
            x.leaf("span", "rname", r.reaction().name());
        }
        x.leaf("span", "tag", r.reactionClass().label());
        if (r.reaction().line() > 0) {
            x.leaf("span", "tag", m.file() + ":" + r.reaction().line());
        }
        if (map != null) {
            x.leaf("span", "tag", "map: " + map.status());
        }
        x.end().nl();
        equation();
        findings();
        fixHints();
        balance();
        picture();
        x.end().nl();
    }

    private void equation() throws XMLStreamException {
        x.start("p", "eq");
        side(r.reaction().reactants());
        x.leaf("span", "arrow", r.reaction().reversible() ? "\u21CC" : "\u2192");
        side(r.reaction().products());
        x.end().nl();
    }

    private void side(List<Participant> participants) throws XMLStreamException {
        if (participants.isEmpty()) {
            x.leaf("span", "rname", "(nothing)");
            return;
        }
        for (int i = 0; i < participants.size(); i++) {
            Participant p = participants.get(i);
            if (i > 0) {
                x.text(" + ");
            }
            String coefficient = p.stoichiometryText() == null ? "?" : p.stoichiometryText().strip();
            if (!coefficient.equals("1") && !coefficient.equals("1.0")) {
                x.text(coefficient + " ");
            }
            SpeciesInfo s = m.model().species(p.species()).orElse(null);
            String title = s == null ? "not in the model"
                    : (s.formulaText() == null ? "no formula" : s.formulaText())
                    + (s.chargeText() == null ? "" : ", charge " + s.chargeText());
            x.start("span").attr("title", title).text(s == null ? p.species() : s.name()).end();
            x.text(" ").leaf("code", null, p.species());
        }
    }

    private void findings() throws XMLStreamException {
        if (r.findings().isEmpty()) {
            return;
        }
        x.start("ul", "findings").nl();
        for (Finding f : r.findings()) {
            x.start("li").leaf("span", "sev " + f.severity().label(), f.severity().label()).text(" ")
                    .text(f.message()).text(" ").leaf("span", "rule", f.ruleId()).end().nl();
        }
        x.end().nl();
    }

    /** The fix hints carried by the findings' {@code fix.*} data, one line per distinct hint. */
    private void fixHints() throws XMLStreamException {
        SortedMap<String, String> fix = new TreeMap<>();
        for (Finding f : r.findings()) {
            f.data().forEach((k, v) -> {
                if (k.startsWith("fix.")) {
                    fix.put(k.substring(4), v);
                }
            });
        }
        if (fix.isEmpty()) {
            return;
        }
        StringBuilder sb = new StringBuilder("Suggested fix: add ");
        boolean first = true;
        if (fix.containsKey("protons")) {
            sb.append(fix.remove("protons")).append(" H+");
            String sp = fix.remove("protonSpecies");
            sb.append(sp == null ? "" : " (" + sp + ")").append(" to the ").append(fix.remove("protonSide"));
            first = false;
        }
        if (fix.containsKey("water")) {
            sb.append(first ? "" : " and ").append(fix.remove("water")).append(" H2O");
            String sp = fix.remove("waterSpecies");
            sb.append(sp == null ? "" : " (" + sp + ")").append(" to the ").append(fix.remove("waterSide"));
            first = false;
        }
        if (first) {
            sb.setLength(0);
            sb.append("Suggested fix:");
        }
        fix.forEach((k, v) -> sb.append("; ").append(k).append(' ').append(v));
        sb.append(". Check the chemistry before applying it.");
        x.leaf("p", "fix", sb.toString()).nl();
    }

    private void balance() throws XMLStreamException {
        if (!r.reactionClass().balanceComputed()) {
            x.leaf("p", "nomap", "Balance is not checked for " + r.reactionClass().label() + " reactions.").nl();
            return;
        }
        BalanceTable t = BalanceTable.of(r.reaction(), chemistry);
        boolean off = r.balance().elementImbalanced() || r.balance().chargeImbalanced() || !t.complete();
        x.start("details", "balance");
        if (off) {
            x.attr("open", "open");
        }
        x.leaf("summary", null, "balance: " + (t.complete() ? "elements " + Deltas.format(r.balance().elements())
                : "elements not computable") + ", charge "
                + (r.balance().charge() == null ? "not computable" : Deltas.signed(r.balance().charge())));
        if (!t.rows().isEmpty() || t.charge() != null) {
            x.start("table").start("tr").leaf("th", null, "").leaf("th", "n", "reactants")
                    .leaf("th", "n", "products").leaf("th", "n", "\u0394 (products \u2212 reactants)").end();
            for (BalanceTable.Row row : t.rows()) {
                row(row);
            }
            if (t.charge() != null) {
                row(t.charge());
            }
            x.end();
        }
        List<String> missing = new java.util.ArrayList<>();
        addAll(missing, "no formula", r.balance().withoutFormula());
        addAll(missing, "invalid formula", r.balance().invalidFormula());
        addAll(missing, "polymer formula", r.balance().polymer());
        addAll(missing, "no charge", r.balance().withoutCharge());
        addAll(missing, "not in the model", r.balance().missingSpecies());
        r.balance().badCoefficients().forEach((s, text) -> missing.add(s + " (coefficient '" + text + "')"));
        if (!missing.isEmpty()) {
            x.leaf("p", "nomap", "Unknown: " + String.join("; ", missing) + ".");
        }
        x.end().nl();
    }

    private static void addAll(List<String> out, String what, List<String> species) {
        if (!species.isEmpty()) {
            out.add(what + ": " + String.join(", ", species));
        }
    }

    private void row(BalanceTable.Row row) throws XMLStreamException {
        Rational d = row.delta();
        x.start("tr").leaf("td", null, row.label()).leaf("td", "n", number(row.reactants()))
                .leaf("td", "n", number(row.products())).leaf("td", "n d" + (d.isZero() ? "" : " nz"), Deltas.signed(d))
                .end();
    }

    private static String number(Rational q) {
        String s = Deltas.signed(q);
        return s.startsWith("+") ? s.substring(1) : s;
    }

    private void picture() throws XMLStreamException {
        if (map == null) {
            x.leaf("p", "nomap", "No atom map for this reaction: balance only.").nl();
            return;
        }
        x.start("figure", "pic").nl();
        // A note already said by one of the card's findings (the stereo pin) is not repeated.
        List<String> notes = map.notes().stream()
                .filter(n -> r.findings().stream().noneMatch(f -> f.message().contains(n)))
                .collect(java.util.stream.Collectors.toCollection(java.util.ArrayList::new));
        if (map.drawing() != null && !pictureAllowed) {
            x.leaf("p", "nomap", "Drawing left out: the report holds at most " + HtmlReporter.MAX_PICTURES
                    + " pictures.").nl();
        } else if (map.drawn()) {
            PictureFile p = map.picture();
            String src = PictureFiles.FOLDER + "/" + p.file();
            // A CSS background, not an <img>: Chromium loads every <img> of the page at once
            // (headless, it ignores loading="lazy"), while a background inside an article that
            // content-visibility skips is not even requested. See DEVELOPERS.md.
            x.start("div", "pic-box");
            x.start("div", "pic").attr("role", "img").attr("aria-label", "Atom map of " + r.id())
                    .attr("style", "--pic:url(" + src + ");--pic-idx:url(" + src + "#indices);aspect-ratio:"
                            + p.width() + "/" + p.height() + ";max-width:" + p.width() + "px").end();
            x.end().nl();
            p.notes().forEach(n -> notes.add("Drawing: " + n));
        } else if (map.picture() != null) {
            map.picture().notes().forEach(n -> notes.add("No drawing: " + n));
        }
        StringBuilder caption = new StringBuilder(map.summary());
        boolean shown = map.drawn() && pictureAllowed;
        if (shown) {
            caption.append(caption.length() == 0 ? "" : " ")
                    .append("Carbons that move between molecules or change a bond are coloured and numbered; each"
                            + " keeps its colour and number across the arrow. Parts the reaction leaves unchanged"
                            + " (cofactors, carriers) are drawn faint. ");
        }
        x.start("figcaption").text(caption.toString());
        if (shown) {
            x.start("a").attr("href", PictureFiles.FOLDER + "/" + map.picture().file()).text("Open the drawing").end();
            x.text(" (");
            x.start("a").attr("href", PictureFiles.FOLDER + "/" + map.picture().file() + "#indices")
                    .text("with atom indices").end();
            x.text(").");
        }
        x.end().nl();
        if (!notes.isEmpty()) {
            x.start("ul", "findings");
            for (String n : notes) {
                x.leaf("li", null, n);
            }
            x.end().nl();
        }
        HtmlConfidence.write(x, r.mapping(), r.findings(), m.mapping().structures());
        x.end().nl();
    }

}
