package io.github.atomledger.checker.check.balance;

import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * {@code model.charge-invalid}: a species' charge is not a number, or not an integer where the
 * fbc version requires one (fbc 1 and 2: "a signed integer"; fbc 3 allows decimals). Data:
 * {@code charge}, {@code reason}, {@code source}.
 */
public final class ChargeSyntaxCheck implements ModelCheck {

    @Override
    public String ruleId() {
        return "model.charge-invalid";
    }

    @Override
    public String description() {
        return "A species' charge is not a number, or not an integer where the fbc version requires one.";
    }

    @Override
    public Severity defaultSeverity() {
        return Severity.ERROR;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        List<Finding> out = new ArrayList<>();
        for (SpeciesInfo s : context.model().species()) {
            String error = context.chemistry(s.id()).map(SpeciesChemistry::chargeError).orElse(null);
            if (error == null) {
                continue;
            }
            out.add(context.finding(this, s.id(), s.line(), "Species " + s.id() + " has an unusable "
                    + FormulaSyntaxCheck.printable(error) + ".",
                    Map.of("charge", s.chargeText(), "reason", error, "source", s.chargeSource().label())));
        }
        return out;
    }
}
