package io.github.atomledger.checker.report;

import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.check.balance.ReactionBalance;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The one set of balance counts every report prints (console, HTML, Markdown, JSON, JUnit
 * properties), defined once here and in {@code docs/report-schema.json}:
 * <ul>
 *   <li>{@code checked}: reactions of a class whose balance is computed (internal, transport,
 *       ATP maintenance, biomass, pseudo); {@code notChecked}: exchange, demand and sink reactions;</li>
 *   <li>per quantity (elements, charge) among the checked reactions: {@code balanced},
 *       {@code imbalanced} and {@code notComputable} (a participant lacks what is needed), which add
 *       up to {@code checked};</li>
 *   <li>{@code because}: for the not computable ones, how many reactions each reason blocks
 *       ({@code missingFormula}, {@code invalidFormula}, {@code polymerFormula}, {@code missingCharge},
 *       {@code unknownSpecies}, {@code badCoefficient}; a reaction may have several);</li>
 *   <li>{@code speciesWithoutFormula}, {@code speciesWithoutCharge}: species of the model that
 *       declare none.</li>
 * </ul>
 */
record ModelCounts(int reactions, int checked, int notChecked, Quantity elements, Quantity charge,
                   int species, int speciesWithoutFormula, int speciesWithoutCharge) {

    /** One quantity's counts; {@code because} is sorted by reason name. */
    record Quantity(int balanced, int imbalanced, int notComputable, Map<String, Integer> because) {

        Quantity {
            because = Collections.unmodifiableMap(new LinkedHashMap<>(because));
        }
    }

    static ModelCounts of(ModelResult m) {
        int checked = 0;
        int[] el = new int[3];
        int[] ch = new int[3];
        Map<String, Integer> elWhy = new java.util.TreeMap<>();
        Map<String, Integer> chWhy = new java.util.TreeMap<>();
        for (ReactionResult r : m.reactions()) {
            if (!r.reactionClass().balanceComputed()) {
                continue;
            }
            checked++;
            ReactionBalance b = r.balance();
            if (!b.elementsComputable()) {
                el[2]++;
                reason(elWhy, "missingFormula", b.withoutFormula());
                reason(elWhy, "invalidFormula", b.invalidFormula());
                reason(elWhy, "polymerFormula", b.polymer());
                reason(elWhy, "unknownSpecies", b.missingSpecies());
                reason(elWhy, "badCoefficient", new ArrayList<>(b.badCoefficients().keySet()));
            } else if (b.elementImbalanced()) {
                el[1]++;
            } else {
                el[0]++;
            }
            if (b.charge() == null) {
                ch[2]++;
                reason(chWhy, "missingCharge", b.withoutCharge());
                reason(chWhy, "unknownSpecies", b.missingSpecies());
                reason(chWhy, "badCoefficient", new ArrayList<>(b.badCoefficients().keySet()));
            } else if (b.chargeImbalanced()) {
                ch[1]++;
            } else {
                ch[0]++;
            }
        }
        int noFormula = 0;
        int noCharge = 0;
        for (SpeciesInfo s : m.model().species()) {
            noFormula += s.formulaText() == null ? 1 : 0;
            noCharge += s.chargeText() == null ? 1 : 0;
        }
        return new ModelCounts(m.reactions().size(), checked, m.reactions().size() - checked,
                new Quantity(el[0], el[1], el[2], elWhy), new Quantity(ch[0], ch[1], ch[2], chWhy),
                m.model().species().size(), noFormula, noCharge);
    }

    private static void reason(Map<String, Integer> why, String key, List<String> species) {
        if (!species.isEmpty()) {
            why.merge(key, 1, Integer::sum);
        }
    }

    /** Reactions whose element balance is known and not zero (checked classes only). */
    static long elementImbalanced(ModelResult m) {
        return of(m).elements().imbalanced();
    }

    /** Reactions whose charge balance is known and not zero (checked classes only). */
    static long chargeImbalanced(ModelResult m) {
        return of(m).charge().imbalanced();
    }

    /**
     * Why a quantity was not computable, in words: {@code "no species has a charge"} or
     * {@code "a participant without a charge (39 species have none)"}; empty when everything was computed.
     */
    String whyCharge() {
        if (charge.notComputable() == 0) {
            return "";
        }
        if (speciesWithoutCharge == species && species > 0) {
            return "no species has a charge";
        }
        return why(charge.because(), speciesWithoutCharge, "charge");
    }

    /** The same for the element balance. */
    String whyElements() {
        if (elements.notComputable() == 0) {
            return "";
        }
        if (speciesWithoutFormula == species && species > 0) {
            return "no species has a formula";
        }
        return why(elements.because(), speciesWithoutFormula, "formula");
    }

    private static String why(Map<String, Integer> because, int speciesWithout, String what) {
        List<String> parts = new ArrayList<>();
        because.forEach((k, n) -> parts.add(switch (k) {
            case "missingFormula" -> Wording.count(n, "reaction") + " with a participant without a formula";
            case "invalidFormula" -> Wording.count(n, "reaction") + " with an unreadable formula";
            case "polymerFormula" -> Wording.count(n, "reaction") + " with a polymer formula";
            case "missingCharge" -> Wording.count(n, "reaction") + " with a participant without a charge";
            case "unknownSpecies" -> Wording.count(n, "reaction") + " naming a species the model lacks";
            case "badCoefficient" -> Wording.count(n, "reaction") + " with an unusable coefficient";
            default -> Wording.count(n, "reaction") + " (" + k + ")";
        }));
        String text = Wording.and(parts);
        if (speciesWithout > 0) {
            text += "; " + speciesWithout + " species " + (speciesWithout == 1 ? "has" : "have") + " no " + what;
        }
        return text;
    }

    /**
     * The balance line of the console and the HTML summary: {@code "balance of 75 checked reactions
     * (20 exchange, demand or sink reactions not checked): elements 13 imbalanced, 0 not
     * computable; charge 0 imbalanced, 75 not computable (no species has a charge)"}.
     */
    String balanceLine() {
        StringBuilder sb = new StringBuilder("balance of ").append(Wording.count(checked, "checked reaction"));
        if (notChecked > 0) {
            sb.append(" (").append(notChecked).append(" exchange, demand or sink ")
                    .append(notChecked == 1 ? "reaction" : "reactions").append(" not checked)");
        }
        sb.append(": elements ").append(elements.imbalanced()).append(" imbalanced, ")
                .append(elements.notComputable()).append(" not computable");
        if (!whyElements().isEmpty()) {
            sb.append(" (").append(whyElements()).append(')');
        }
        sb.append("; charge ").append(charge.imbalanced()).append(" imbalanced, ")
                .append(charge.notComputable()).append(" not computable");
        if (!whyCharge().isEmpty()) {
            sb.append(" (").append(whyCharge()).append(')');
        }
        return sb.toString();
    }

    /** The JSON form ({@code summary.balance} of a model in report.json). */
    Map<String, Object> json() {
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("checked", checked);
        o.put("notChecked", notChecked);
        o.put("elements", quantity(elements));
        o.put("charge", quantity(charge));
        o.put("speciesWithoutFormula", speciesWithoutFormula);
        o.put("speciesWithoutCharge", speciesWithoutCharge);
        return o;
    }

    private static Map<String, Object> quantity(Quantity q) {
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("balanced", q.balanced());
        o.put("imbalanced", q.imbalanced());
        o.put("notComputable", q.notComputable());
        o.put("because", new LinkedHashMap<>(q.because()));
        return o;
    }
}
