package io.github.atomledger.checker.check.balance;

import io.github.atomledger.atommapper.formula.FormulaSyntaxException;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * {@code model.formula-invalid}: a species' formula text does not follow the fbc grammar (symbols
 * with optional integer counts; {@code (...)n} groups). Data: {@code formula}, {@code position}
 * (1-based), {@code reason}, {@code source}.
 */
public final class FormulaSyntaxCheck implements ModelCheck {

    @Override
    public String ruleId() {
        return "model.formula-invalid";
    }

    @Override
    public String description() {
        return "A species' chemical formula is not valid fbc formula syntax.";
    }

    @Override
    public Severity defaultSeverity() {
        return Severity.ERROR;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        List<Finding> out = new ArrayList<>();
        for (SpeciesInfo s : context.model().species()) {
            FormulaSyntaxException e = context.chemistry(s.id()).map(SpeciesChemistry::formulaError).orElse(null);
            if (e == null) {
                continue;
            }
            out.add(context.finding(this, s.id(), s.line(), "Species " + s.id() + " has an invalid formula '"
                    + printable(e.text()) + "': " + e.reason() + " at position " + (e.position() + 1) + ".",
                    Map.of("formula", e.text(), "position", Integer.toString(e.position() + 1),
                            "reason", e.reason(), "source", s.formulaSource().label())));
        }
        return out;
    }

    static String printable(String text) {
        StringBuilder sb = new StringBuilder();
        text.codePoints().forEach(cp -> {
            if (Character.isISOControl(cp)) {
                sb.append(String.format("\\u%04x", cp));
            } else {
                sb.appendCodePoint(cp);
            }
        });
        return sb.length() > 80 ? sb.substring(0, 77) + "..." : sb.toString();
    }
}
