package io.github.atomledger.checker.check.balance;

import io.github.atomledger.atommapper.formula.Formula;
import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SortedSet;
import java.util.TreeSet;

/**
 * {@code model.unknown-symbol}: a formula uses a symbol that is not a chemical element and not one
 * of the generic symbols R and X (fbc version 3: "Generic components can only be specified as
 * the symbols R or X"). Such symbols (Protein, ACP, typos such as "Cc" or "Ph") balance by
 * count, but a curator should look. A typo that happens to be an element ("Co"
 * for "CO") cannot be seen here; it shows up as an imbalance. Data: {@code symbols}, {@code formula}.
 */
public final class SymbolCheck implements ModelCheck {

    @Override
    public String ruleId() {
        return "model.unknown-symbol";
    }

    @Override
    public String description() {
        return "A formula uses a symbol that is neither a chemical element nor the generic R or X.";
    }

    @Override
    public Severity defaultSeverity() {
        return Severity.WARNING;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        List<Finding> out = new ArrayList<>();
        for (SpeciesInfo s : context.model().species()) {
            Formula f = context.chemistry(s.id()).map(SpeciesChemistry::formula).orElse(null);
            if (f == null) {
                continue;
            }
            SortedSet<String> unknown = new TreeSet<>(f.pseudoElements());
            unknown.remove("R");
            unknown.remove("X");
            if (unknown.isEmpty()) {
                continue;
            }
            out.add(context.finding(this, s.id(), s.line(), "Species " + s.id() + " has formula '" + s.formulaText()
                    + "' with " + (unknown.size() == 1 ? "a symbol that is not a chemical element: "
                    : "symbols that are not chemical elements: ") + String.join(", ", unknown)
                    + " (counted as pseudo-elements).",
                    Map.of("symbols", String.join(",", unknown), "formula", s.formulaText())));
        }
        return out;
    }
}
