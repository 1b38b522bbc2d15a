package io.github.atomledger.checker.report;

import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.StandardChecks;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

/**
 * A finding in one line for people, shared by the console and the HTML overview: what it is about
 * ({@code R_PFK phosphofructokinase (models/m.xml:120)}) and why, in words
 * ({@code C -20: the products have 20 carbons fewer}), read from the finding's data rather than
 * parsed from its message.
 */
final class FindingWords {

    private static final Map<String, String> DESCRIPTIONS = descriptions();

    private FindingWords() {
    }

    private static Map<String, String> descriptions() {
        Map<String, String> d = new TreeMap<>();
        for (ModelCheck c : StandardChecks.all()) {
            d.put(c.ruleId(), c.description());
        }
        return d;
    }

    /** The rule's one-line description, or empty for rules outside the standard checks. */
    static Optional<String> description(String ruleId) {
        return Optional.ofNullable(DESCRIPTIONS.get(ruleId));
    }

    /**
     * Id, name when it differs, and {@code file:line}: {@code R_PFK phosphofructokinase (m.xml:120)}.
     * A model-level finding names the file alone.
     */
    static String subject(Finding f, ModelResult m) {
        String where = f.modelFile() + (f.line() > 0 ? ":" + f.line() : "");
        if (f.elementId().isEmpty() || (f.elementId().equals(m.model().modelId()) && f.line() == 0)) {
            return where;
        }
        return f.elementId() + name(f.elementId(), m).map(n -> " " + n).orElse("") + " (" + where + ")";
    }

    /** The element's name when the model gives one that is not just the id. */
    static Optional<String> name(String id, ModelResult m) {
        Optional<String> n = m.model().species(id).map(SpeciesInfo::name);
        if (n.isEmpty()) {
            n = m.reactions().stream().filter(r -> r.id().equals(id)).findFirst().map(r -> r.reaction().name());
        }
        return n.filter(x -> !x.isBlank() && !x.equals(id));
    }

    /** Why, in words; the finding's message when there is nothing better to say. */
    static String reason(Finding f) {
        Map<String, String> d = f.data();
        return switch (f.ruleId()) {
            case "balance.elements" -> {
                List<String> parts = deltas(d, false);
                String fix = fix(d);
                yield String.join("; ", parts) + (fix.isEmpty() ? "" : "; " + fix + " would balance it");
            }
            case "balance.charge" -> d.containsKey("delta.charge")
                    ? Wording.chargeDelta(Rational.parse(d.get("delta.charge"))) : f.message();
            case "mapping.unmappable" -> {
                List<String> parts = deltas(d, false);
                yield parts.isEmpty() ? f.message() : "heavy atoms do not balance, so no atom map exists: "
                        + String.join("; ", parts);
            }
            default -> f.message();
        };
    }

    /** For a charge finding on a reaction whose element balance is unknown: why it is unknown. */
    static String unknownElements(Finding f, ModelResult m) {
        if (!f.ruleId().equals("balance.charge")) {
            return "";
        }
        return m.reactions().stream().filter(r -> r.id().equals(f.elementId())).findFirst()
                .filter(r -> !r.balance().elementsComputable())
                .map(r -> "; the element balance is unknown" + (r.balance().withoutFormula().isEmpty() ? ""
                        : ": no formula for " + Wording.shortList(r.balance().withoutFormula(), 3)))
                .orElse("");
    }

    /** Element (and with {@code charge}, charge) imbalances from {@code delta.*} data, in words. */
    private static List<String> deltas(Map<String, String> d, boolean charge) {
        List<String> out = new ArrayList<>();
        d.forEach((k, v) -> {
            if (k.startsWith("delta.") && !k.equals("delta.charge")) {
                try {
                    out.add(Wording.elementDelta(k.substring(6), Rational.parse(v)));
                } catch (NumberFormatException e) {
                    out.add(k.substring(6) + " " + v);
                }
            }
        });
        if (charge && d.containsKey("delta.charge")) {
            out.add(Wording.chargeDelta(Rational.parse(d.get("delta.charge"))));
        }
        return out;
    }

    /** "adding 1 H+ (h_c) to the products" from the {@code fix.*} data, or "". */
    static String fix(Map<String, String> d) {
        List<String> parts = new ArrayList<>();
        if (d.containsKey("fix.protons")) {
            parts.add(d.get("fix.protons") + " H+" + (d.containsKey("fix.protonSpecies") ? " (" + d.get("fix.protonSpecies") + ")" : "")
                    + " to the " + d.getOrDefault("fix.protonSide", "products"));
        }
        if (d.containsKey("fix.water")) {
            parts.add(d.get("fix.water") + " H2O" + (d.containsKey("fix.waterSpecies") ? " (" + d.get("fix.waterSpecies") + ")" : "")
                    + " to the " + d.getOrDefault("fix.waterSide", "products"));
        }
        return parts.isEmpty() ? "" : "adding " + String.join(" and ", parts);
    }

    /** Reactions a {@code balance.common-cause} finding explains, to the species it names (name or id). */
    static Map<String, String> explainedBy(List<Finding> findings, ModelResult m) {
        Map<String, String> out = new TreeMap<>();
        for (Finding f : findings) {
            if (f.ruleId().equals("balance.common-cause") && f.data().containsKey("reactions")) {
                String who = name(f.elementId(), m).orElse(f.elementId());
                for (String r : f.data().get("reactions").split(",")) {
                    out.putIfAbsent(r, who);
                }
            }
        }
        return out;
    }
}
