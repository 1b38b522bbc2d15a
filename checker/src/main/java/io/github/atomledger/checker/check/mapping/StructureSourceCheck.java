package io.github.atomledger.checker.check.mapping;

import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.structure.SpeciesStructures;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Problems with species structure sources: {@code structure.invalid} (a SMILES or InChI that does
 * not parse), {@code structure.conflict} (two sources give different structures; the one with
 * precedence is used) and {@code structure.unknown-species} (a side-table row names no species).
 * Data: {@code source}, {@code text}, {@code reason}, {@code tableLine}.
 */
public final class StructureSourceCheck implements ModelCheck {

    private final String kind;

    private StructureSourceCheck(String kind) {
        this.kind = kind;
    }

    public static List<ModelCheck> all() {
        return List.of(new StructureSourceCheck("invalid"), new StructureSourceCheck("conflict"),
                new StructureSourceCheck("unknown-species"));
    }

    @Override
    public String ruleId() {
        return "structure." + kind;
    }

    @Override
    public String description() {
        return switch (kind) {
            case "invalid" -> "A species' SMILES or InChI cannot be read.";
            case "conflict" -> "Two structure sources give different structures for one species.";
            default -> "The structure table names a species that the model does not define.";
        };
    }

    @Override
    public Severity defaultSeverity() {
        return kind.equals("invalid") ? Severity.ERROR : Severity.WARNING;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        List<Finding> out = new ArrayList<>();
        for (SpeciesStructures.Problem p : context.mapping().structures().problems()) {
            if (!p.kind().equals(kind)) {
                continue;
            }
            int line = context.model().species(p.species()).map(s -> s.line()).orElse(0);
            String text = p.text().length() > 120 ? p.text().substring(0, 117) + "..." : p.text();
            out.add(context.finding(this, p.species(), line, (kind.equals("invalid") ? "The " + p.source().label()
                    + " structure of species " + p.species() + " cannot be read: " : "Species " + p.species() + ": ")
                    + p.message().replaceAll("\\s+", " ") + ".",
                    Map.of("source", p.source().label(), "text", text, "reason", p.message(),
                            "tableLine", Integer.toString(p.tableLine()))));
        }
        return out;
    }
}
