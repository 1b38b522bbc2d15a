package io.github.atomledger.checker.check.mapping;

import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.structure.SpeciesStructures;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Problems with species structure sources: {@code structure.invalid} (a SMILES or InChI that does
 * not parse), {@code structure.conflict} (two sources give different structures; the one with
 * precedence is used) and {@code structure.unknown-species} (a side-table row names no species).
 * A problem with a row of the structure table points at the table's file and line (so SARIF and
 * the console show where to edit); others at the species in the model. Data: {@code source},
 * {@code text}, {@code reason}, {@code tableLine}, and {@code table} for table rows.
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
            String text = Wording.cut(p.text(), 120);
            String table = context.mapping().structures().tableFile();
            boolean inTable = !kind.equals("conflict") && p.source() == SpeciesStructures.Source.TABLE && !table.isEmpty()
                    && p.tableLine() > 0;
            java.util.SortedMap<String, String> data = new TreeMap<>(Map.of("source", p.source().label(), "text", text,
                    "reason", p.message(), "tableLine", Integer.toString(p.tableLine())));
            String reason = p.message().replaceAll("\\s+", " ");
            String message = switch (kind) {
                case "invalid" -> "The " + (inTable ? "structure table's" : p.source().label()) + " structure of species "
                        + p.species() + " cannot be read: " + reason + ".";
                case "unknown-species" -> Character.toUpperCase(reason.charAt(0)) + reason.substring(1) + ".";
                default -> "Species " + p.species() + ": " + reason + ".";
            };
            if (inTable) {
                data.put("table", table);
                out.add(new Finding(ruleId(), defaultSeverity(), table, p.species(), p.tableLine(), message, data));
            } else {
                int line = context.model().species(p.species()).map(s -> s.line()).orElse(0);
                out.add(context.finding(this, p.species(), line, message, data));
            }
        }
        return out;
    }
}
