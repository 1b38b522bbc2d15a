package io.github.atomledger.checker.check.integrity;

import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.model.Participant;
import io.github.atomledger.checker.model.ReactionInfo;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * {@code model.reference-invalid}: a species reference names a species the model does not have,
 * or its stoichiometry is unset (Level 3), not a finite number, or negative. Data: {@code species},
 * {@code problem} ("unknown-species", "unset", "not-a-number", "negative"), {@code stoichiometry}.
 */
public final class ReferenceCheck implements ModelCheck {

    @Override
    public String ruleId() {
        return "model.reference-invalid";
    }

    @Override
    public String description() {
        return "A species reference names an unknown species or has an unusable stoichiometry.";
    }

    @Override
    public Severity defaultSeverity() {
        return Severity.ERROR;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        List<Finding> out = new ArrayList<>();
        for (ReactionInfo r : context.model().reactions()) {
            for (Participant p : r.participants()) {
                int line = p.line() > 0 ? p.line() : r.line();
                if (context.model().species(p.species()).isEmpty()) {
                    out.add(context.finding(this, r.id(), line, "Reaction " + r.id() + " refers to species '"
                            + p.species() + "', which the model does not define.",
                            Map.of("species", p.species(), "problem", "unknown-species")));
                    continue;
                }
                String problem = problem(p.stoichiometryText());
                if (problem != null) {
                    String text = p.stoichiometryText() == null ? "" : p.stoichiometryText();
                    out.add(context.finding(this, r.id(), line, "Reaction " + r.id() + " has an unusable stoichiometry for "
                            + p.species() + ": " + (text.isEmpty() ? "not set" : "'" + text + "' (" + problem + ")") + ".",
                            Map.of("species", p.species(), "problem", problem, "stoichiometry", text)));
                }
            }
        }
        return out;
    }

    private static String problem(String text) {
        if (text == null) {
            return "unset";
        }
        try {
            return Rational.parse(text).signum() < 0 ? "negative" : null;
        } catch (NumberFormatException e) {
            return "not-a-number";
        }
    }
}
