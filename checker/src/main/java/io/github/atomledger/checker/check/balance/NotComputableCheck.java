package io.github.atomledger.checker.check.balance;

import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.model.ReactionInfo;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * {@code balance.not-computable}: the element balance of a reaction cannot be computed, because a
 * participant has no formula, an invalid one, an unusable coefficient, or does not exist. Such a
 * reaction is not "balanced"; it is unknown. Polymer formulas have their own rule,
 * {@code balance.polymer}. Data: {@code class} and comma lists {@code withoutFormula},
 * {@code invalidFormula}, {@code missingSpecies}, {@code badCoefficients}.
 */
public final class NotComputableCheck implements ModelCheck {

    @Override
    public String ruleId() {
        return "balance.not-computable";
    }

    @Override
    public String description() {
        return "A reaction's element balance cannot be computed (a participant lacks a usable formula or coefficient).";
    }

    @Override
    public Severity defaultSeverity() {
        return Severity.WARNING;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        List<Finding> out = new ArrayList<>();
        for (ReactionInfo r : context.model().reactions()) {
            ReactionBalance b = context.balance(r.id());
            boolean blocked = !b.withoutFormula().isEmpty() || !b.invalidFormula().isEmpty()
                    || !b.missingSpecies().isEmpty() || !b.badCoefficients().isEmpty();
            if (!b.reactionClass().balanceComputed() || !blocked) {
                continue;
            }
            Map<String, String> data = new TreeMap<>();
            data.put("class", b.reactionClass().label());
            List<String> why = new ArrayList<>();
            put(data, why, "withoutFormula", b.withoutFormula(), "no formula for ");
            put(data, why, "invalidFormula", b.invalidFormula(), "invalid formula for ");
            put(data, why, "missingSpecies", b.missingSpecies(), "unknown species ");
            if (!b.badCoefficients().isEmpty()) {
                List<String> bad = new ArrayList<>();
                b.badCoefficients().forEach((s, t) -> bad.add(s + "=" + t));
                put(data, why, "badCoefficients", bad, "unusable coefficient for ");
            }
            out.add(context.finding(this, r.id(), r.line(), "The element balance of reaction " + r.id()
                    + " cannot be computed: " + String.join("; ", why) + ".", data));
        }
        return out;
    }

    private static void put(Map<String, String> data, List<String> why, String key, List<String> ids, String label) {
        if (!ids.isEmpty()) {
            data.put(key, String.join(",", ids));
            why.add(label + String.join(", ", ids));
        }
    }
}
