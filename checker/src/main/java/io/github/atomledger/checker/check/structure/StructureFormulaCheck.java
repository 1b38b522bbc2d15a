package io.github.atomledger.checker.check.structure;

import io.github.atomledger.atommapper.formula.Formula;
import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.balance.SpeciesChemistry;
import io.github.atomledger.checker.model.SpeciesInfo;


import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.StringJoiner;
import java.util.TreeMap;

/**
 * Compares each species' declared formula and charge with those CDK derives from its structure
 * (the structure chosen by {@link StructureResolver}: side table, MIRIAM InChI or a stored
 * structure; so the comparison runs when mapping is on, which setting {@code atomledger.structures}
 * does), one rule per outcome:
 * <ul>
 *   <li>{@code structure.formula-mismatch} (error): a heavy atom (any symbol but H) differs, or
 *       H and charge differ by different amounts, or only the charge differs;</li>
 *   <li>{@code structure.protonation} (warning): only the protonation state differs, that is H
 *       and charge differ by the same amount k (the structure is drawn with k protons more or
 *       fewer than the formula: a common, milder mismatch, for example a neutral SMILES for a
 *       species given as the ion dominant at pH 7). Per-species noise on a genome-scale model
 *       (850 species of yeast-GEM), so one finding per model lists them all: data
 *       {@code species} (comma list), {@code protons} (structure minus declared, in the same
 *       order), {@code count}.</li>
 * </ul>
 * Unreadable structures are {@code structure.invalid} ({@link io.github.atomledger.checker.check.mapping.StructureSourceCheck}).
 * Species without a usable declared formula, or with a {@code (...)n} formula, are not compared.
 * Data: {@code declared}, {@code derived} (Hill formulas), {@code declaredCharge},
 * {@code derivedCharge}, {@code delta.<symbol>} (declared − derived), {@code delta.charge},
 * {@code structure} (the text), {@code source}.
 */
public final class StructureFormulaCheck implements ModelCheck {

    /** Which of the two outcomes this instance reports. */
    private enum Outcome {
        MISMATCH("structure.formula-mismatch", Severity.ERROR,
                "A species' formula or charge disagrees with its structure beyond protonation."),
        PROTONATION("structure.protonation", Severity.WARNING,
                "A species' structure differs from its formula and charge only by protons.");

        final String ruleId;
        final Severity severity;
        final String description;

        Outcome(String ruleId, Severity severity, String description) {
            this.ruleId = ruleId;
            this.severity = severity;
            this.description = description;
        }
    }

    private final Outcome outcome;

    private StructureFormulaCheck(Outcome outcome) {
        this.outcome = outcome;
    }

    public static StructureFormulaCheck mismatch() {
        return new StructureFormulaCheck(Outcome.MISMATCH);
    }

    public static StructureFormulaCheck protonation() {
        return new StructureFormulaCheck(Outcome.PROTONATION);
    }

    @Override
    public String ruleId() {
        return outcome.ruleId;
    }

    @Override
    public String description() {
        return outcome.description;
    }

    @Override
    public Severity defaultSeverity() {
        return outcome.severity;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        List<Finding> out = new ArrayList<>();
        List<String> protonated = new ArrayList<>();
        List<String> protons = new ArrayList<>();
        for (SpeciesInfo s : context.model().species()) {
            SpeciesStructures.Resolved resolved = context.mapping().structures().get(s.id()).orElse(null);
            if (resolved == null) {
                continue;
            }
            Map<String, String> data = new TreeMap<>();
            data.put("structure", resolved.text());
            data.put("source", resolved.source().label());
            Structure structure = resolved.structure();
            SpeciesChemistry chem = context.chemistry(s.id()).orElse(null);
            Formula declared = chem == null ? null : chem.formula();
            if (declared == null || declared.isPolymer()) {
                continue;
            }
            Rational declaredCharge = chem.charge();
            StructureComparison cmp = StructureComparison.of(declared, declaredCharge, structure);
            if (cmp.identical()) {
                continue;
            }
            boolean protonation = cmp.protonationOnly();
            if (protonation != (outcome == Outcome.PROTONATION)) {
                continue;
            }
            data.put("declared", declared.toHillString());
            data.put("derived", structure.formula().toHillString());
            data.put("declaredCharge", declaredCharge == null ? "unknown" : declaredCharge.toString());
            data.put("derivedCharge", Integer.toString(structure.charge()));
            cmp.elements().forEach((k, v) -> data.put("delta." + k, Long.toString(v)));
            if (cmp.charge() != null && !cmp.charge().isZero()) {
                data.put("delta.charge", cmp.charge().toString());
            }
            if (protonation) {
                long k = cmp.hydrogenDifference();
                protonated.add(s.id());
                protons.add((k < 0 ? "+" : "") + (-k));
                continue;
            }
            String message = "Species " + s.id() + " is declared as " + declared.toHillString() + " (charge "
                    + data.get("declaredCharge") + ") but its structure is " + structure.formula().toHillString()
                    + " (charge " + structure.charge() + "): " + describe(cmp) + " (declared minus structure).";
            out.add(context.finding(this, s.id(), s.line(), message, data));
        }
        if (!protonated.isEmpty()) {
            List<String> shown = new ArrayList<>();
            for (int i = 0; i < Math.min(5, protonated.size()); i++) {
                shown.add(protonated.get(i) + " " + protons.get(i));
            }
            String more = protonated.size() > shown.size() ? " and " + (protonated.size() - shown.size()) + " more" : "";
            out.add(context.finding(this, context.model().modelId(), 0, Wording.count(protonated.size(), "species")
                    + (protonated.size() == 1 ? " has a structure that differs" : " have structures that differ")
                    + " from the declared formula and charge only by protons, a protonation-state difference (structure"
                    + " minus declared: " + String.join(", ", shown) + more + "); the reports list every one.",
                    Map.of("species", String.join(",", protonated), "protons", String.join(",", protons),
                            "count", Integer.toString(protonated.size()))));
        }
        return out;
    }

    private static String describe(StructureComparison cmp) {
        StringJoiner j = new StringJoiner(", ");
        cmp.elements().forEach((k, v) -> j.add(k + " " + (v > 0 ? "+" : "") + v));
        if (cmp.charge() != null && !cmp.charge().isZero()) {
            j.add("charge " + (cmp.charge().signum() > 0 ? "+" : "") + cmp.charge().toDecimalString());
        }
        return j.toString();
    }
}
