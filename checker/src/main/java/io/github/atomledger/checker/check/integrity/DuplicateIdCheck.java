package io.github.atomledger.checker.check.integrity;

import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * {@code model.duplicate-id}: an id is used by more than one element (SBML requires SIds to be
 * unique in a model). Checks then see only the first element with that id. Data: {@code id}.
 */
public final class DuplicateIdCheck implements ModelCheck {

    @Override
    public String ruleId() {
        return "model.duplicate-id";
    }

    @Override
    public String description() {
        return "An id is used by more than one element of the model.";
    }

    @Override
    public Severity defaultSeverity() {
        return Severity.ERROR;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        List<Finding> out = new ArrayList<>();
        for (String id : context.model().duplicateIds()) {
            int line = context.model().species(id).map(s -> s.line()).orElse(0);
            out.add(context.finding(this, id, line, "The id '" + id
                    + "' is used by more than one element; only the first is checked.", Map.of("id", id)));
        }
        return out;
    }
}
