package io.github.atomledger.checker.check.balance;

import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.model.Participant;
import io.github.atomledger.checker.model.ReactionInfo;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

/**
 * {@code model.formula-missing} and {@code model.charge-missing}: a species that takes part in a
 * balance-checked reaction has no formula (or no charge). One finding per species, listing the
 * reactions it blocks. Data: {@code reactions} (comma list), {@code reactionCount}. When no species
 * of the model has one, {@link AbsentChemistryCheck} says so once and this check reports nothing.
 */
public final class MissingChemistryCheck implements ModelCheck {

    private final boolean charge;

    private MissingChemistryCheck(boolean charge) {
        this.charge = charge;
    }

    public static MissingChemistryCheck formula() {
        return new MissingChemistryCheck(false);
    }

    public static MissingChemistryCheck charge() {
        return new MissingChemistryCheck(true);
    }

    @Override
    public String ruleId() {
        return charge ? "model.charge-missing" : "model.formula-missing";
    }

    @Override
    public String description() {
        return charge ? "A species in a balance-checked reaction has no charge."
                : "A species in a balance-checked reaction has no chemical formula.";
    }

    @Override
    public Severity defaultSeverity() {
        return charge ? Severity.INFO : Severity.WARNING;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        if (AbsentChemistryCheck.absent(context.model(), charge)) {
            return List.of();
        }
        Map<String, TreeSet<String>> blocked = new LinkedHashMap<>();
        for (ReactionInfo r : context.model().reactions()) {
            if (!context.balance(r.id()).reactionClass().balanceComputed()) {
                continue;
            }
            for (Participant p : r.participants()) {
                context.chemistry(p.species()).ifPresent(c -> {
                    boolean absent = charge ? c.species().chargeText() == null : c.species().formulaText() == null;
                    if (absent) {
                        blocked.computeIfAbsent(p.species(), k -> new TreeSet<>()).add(r.id());
                    }
                });
            }
        }
        List<Finding> out = new ArrayList<>();
        for (Map.Entry<String, TreeSet<String>> e : blocked.entrySet()) {
            SpeciesInfo s = context.model().species(e.getKey()).orElseThrow();
            String what = charge ? "charge" : "formula";
            String list = Wording.shortList(e.getValue(), 5);
            out.add(context.finding(this, s.id(), s.line(), "Species " + s.id() + " has no " + what + ", so the "
                    + (charge ? "charge" : "element") + " balance of " + Wording.count(e.getValue().size(), "reaction")
                    + " cannot be computed: " + list + ".",
                    Map.of("reactions", String.join(",", e.getValue()),
                            "reactionCount", Integer.toString(e.getValue().size()))));
        }
        return out;
    }
}
