package io.github.atomledger.checker.check.mapping;

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
 * {@code mapping.curated-file}: a curated map file ({@code atomledger.curatedMaps}, an MDL RXN
 * file named after a reaction) could not be used: it does not read as an RXN file (the finding
 * names the line), it names no reaction of the model, or the reaction has nothing to check it
 * against (a participant without structure, a class that is not mapped). The rest of the run goes
 * on. A file that reads but does not fit the reaction is {@code mapping.curated-invalid}. Data:
 * {@code file}, {@code fileLine}, {@code reason}.
 */
public final class CuratedFileCheck implements ModelCheck {

    @Override
    public String ruleId() {
        return "mapping.curated-file";
    }

    @Override
    public String description() {
        return "A curated map file (RXN) cannot be read or checked.";
    }

    @Override
    public Severity defaultSeverity() {
        return Severity.ERROR;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        List<Finding> out = new ArrayList<>();
        for (ImportedMap m : context.mapping().imported().values()) {
            if (m.read()) {
                continue;
            }
            ReactionInfo r = context.model().reactions().stream().filter(x -> x.id().equals(m.reactionId())).findFirst()
                    .orElse(null);
            Map<String, String> data = new TreeMap<>();
            data.put("file", m.file());
            data.put("fileLine", Integer.toString(m.line()));
            data.put("reason", m.unreadable());
            String where = m.file() + (m.line() > 0 ? ", line " + m.line() : "");
            out.add(context.finding(this, r == null ? context.model().modelId() : r.id(), r == null ? 0 : r.line(),
                    "The curated map file " + where + " cannot be used: " + m.unreadable().replaceAll("\\s+", " ") + ".",
                    data));
        }
        return out;
    }
}
