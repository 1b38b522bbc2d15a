package io.github.atomledger.checker.check.mapping;

import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.structure.SpeciesStructures;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.StringJoiner;
import java.util.TreeMap;

/**
 * Problems with species structure sources: {@code structure.invalid} (a SMILES, InChI or molfile
 * that does not parse; for a file, the finding names the file, record and line),
 * {@code structure.conflict} (two sources give different structures; the one with precedence is
 * used), {@code structure.unknown-species} (a table row names no species) and
 * {@code structure.unusable-record} (records of an SD file that cannot be used at all, such as a
 * record without the id field: one finding per file and model, naming the first few records).
 * Data: {@code source}, {@code text}, {@code reason}, {@code tableLine}, {@code origin}; for
 * unusable records {@code file}, {@code recordCount}, {@code records} (origins, {@code ;}-separated,
 * at most 20).
 */
public final class StructureSourceCheck implements ModelCheck {

    private final String kind;

    private StructureSourceCheck(String kind) {
        this.kind = kind;
    }

    public static List<ModelCheck> all() {
        return List.of(new StructureSourceCheck("invalid"), new StructureSourceCheck("conflict"),
                new StructureSourceCheck("unknown-species"), new StructureSourceCheck("unusable-record"));
    }

    @Override
    public String ruleId() {
        return "structure." + kind;
    }

    @Override
    public String description() {
        return switch (kind) {
            case "invalid" -> "A species' SMILES, InChI or molfile cannot be read.";
            case "conflict" -> "Two structure sources give different structures for one species.";
            case "unusable-record" -> "Records of a structure file cannot be used (no id, no molfile end).";
            default -> "The structure table names a species that the model does not define.";
        };
    }

    @Override
    public Severity defaultSeverity() {
        return kind.equals("invalid") ? Severity.ERROR : Severity.WARNING;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        if (kind.equals("unusable-record")) {
            return unusable(context);
        }
        List<Finding> out = new ArrayList<>();
        for (SpeciesStructures.Problem p : context.mapping().structures().problems()) {
            if (!p.kind().equals(kind)) {
                continue;
            }
            int line = context.model().species(p.species()).map(s -> s.line()).orElse(0);
            String text = p.text().length() > 120 ? p.text().substring(0, 117) + "..." : p.text();
            Map<String, String> data = new TreeMap<>(Map.of("source", p.source().label(), "text", text, "reason", p.message(),
                    "tableLine", Integer.toString(p.tableLine())));
            if (!p.origin().isEmpty()) {
                data.put("origin", p.origin());
            }
            out.add(context.finding(this, p.species(), line, (kind.equals("invalid") ? "The " + p.source().label()
                    + " structure of species " + p.species() + " cannot be read: " : "Species " + p.species() + ": ")
                    + p.message().replaceAll("\\s+", " ") + ".", data));
        }
        return out;
    }

    private List<Finding> unusable(CheckContext context) {
        Map<String, List<SpeciesStructures.Problem>> byFile = new LinkedHashMap<>();
        for (SpeciesStructures.Problem p : context.mapping().structures().problems()) {
            if (p.kind().equals(kind)) {
                byFile.computeIfAbsent(p.text(), k -> new ArrayList<>()).add(p);
            }
        }
        List<Finding> out = new ArrayList<>();
        byFile.forEach((file, problems) -> {
            StringJoiner records = new StringJoiner("; ");
            StringJoiner shown = new StringJoiner("; ");
            for (int i = 0; i < problems.size() && i < 20; i++) {
                SpeciesStructures.Problem p = problems.get(i);
                records.add(p.origin() + ": " + p.message());
                if (i < 3) {
                    shown.add(p.origin().substring(Math.min(p.origin().length(), file.length())).strip() + ": " + p.message());
                }
            }
            Map<String, String> data = new TreeMap<>();
            data.put("file", file);
            data.put("recordCount", Integer.toString(problems.size()));
            data.put("records", records.toString());
            out.add(context.finding(this, context.model().modelId(), 0, file + ": " + problems.size()
                    + " record(s) cannot be used and are left out (" + shown + (problems.size() > 3 ? "; ..." : "") + ").", data));
        });
        return out;
    }
}
