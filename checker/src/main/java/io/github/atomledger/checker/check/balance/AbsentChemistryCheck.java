package io.github.atomledger.checker.check.balance;

import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.model.ReactionInfo;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.util.List;
import java.util.Map;

/**
 * {@code model.charges-absent} and {@code model.formulas-absent}: no species of the model declares
 * a charge (or a formula), so not one reaction's charge (or element) balance was computed. A run
 * that passes such a model has not checked charge at all; this says so once, as a warning, in place
 * of one {@code model.charge-missing} (or {@code model.formula-missing}) finding per species, which
 * {@link MissingChemistryCheck} then leaves out. Data: {@code species} (species in the model),
 * {@code checkedReactions} (reactions of balance-checked classes).
 */
public final class AbsentChemistryCheck implements ModelCheck {

    private final boolean charge;

    private AbsentChemistryCheck(boolean charge) {
        this.charge = charge;
    }

    public static AbsentChemistryCheck charges() {
        return new AbsentChemistryCheck(true);
    }

    public static AbsentChemistryCheck formulas() {
        return new AbsentChemistryCheck(false);
    }

    @Override
    public String ruleId() {
        return charge ? "model.charges-absent" : "model.formulas-absent";
    }

    @Override
    public String description() {
        return charge ? "No species of the model has a charge, so no reaction's charge balance is checked."
                : "No species of the model has a formula, so no reaction's element balance is checked.";
    }

    @Override
    public Severity defaultSeverity() {
        return Severity.WARNING;
    }

    /** True when the model has species and none of them declares a charge (or a formula). */
    static boolean absent(ModelView model, boolean charge) {
        List<SpeciesInfo> species = model.species();
        return !species.isEmpty() && species.stream()
                .allMatch(s -> (charge ? s.chargeText() : s.formulaText()) == null);
    }

    @Override
    public List<Finding> check(CheckContext context) {
        ModelView model = context.model();
        if (!absent(model, charge)) {
            return List.of();
        }
        long checked = model.reactions().stream().map(ReactionInfo::id).distinct()
                .filter(id -> context.balance(id).reactionClass().balanceComputed()).count();
        if (checked == 0) {
            return List.of();
        }
        String what = charge ? "charge" : "formula";
        String message = "No species of the model declares a " + what + " (" + Wording.count(model.species().size(), "species")
                + "), so the " + (charge ? "charge" : "element") + " balance of none of its "
                + Wording.count(checked, "checked reaction") + " could be computed; add " + (charge
                ? "fbc:charge attributes (or CHARGE: notes)" : "fbc:chemicalFormula attributes (or FORMULA: notes)")
                + " to check it.";
        return List.of(context.finding(this, model.modelId(), 0, message,
                Map.of("species", Integer.toString(model.species().size()), "checkedReactions", Long.toString(checked))));
    }
}
