package io.github.atomledger.checker.report;

import io.github.atomledger.checker.engine.ReportFormat;
import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.checker.check.mapping.Coverage;
import io.github.atomledger.checker.check.mapping.ReactionMapping;
import io.github.atomledger.checker.check.structure.SpeciesStructures;
import io.github.atomledger.checker.Version;
import io.github.atomledger.checker.baseline.BaselineMatch;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.balance.ReactionBalance;
import io.github.atomledger.checker.engine.BaselineStatus;
import io.github.atomledger.checker.engine.GateMarks;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;
import io.github.atomledger.checker.engine.RunResult;


import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Writes {@code report.json}: the machine interface of AtomLedger, documented in
 * {@code docs/report-schema.json}. Field names are fixed; the shape changes only with
 * {@link #SCHEMA_VERSION}. UTF-8, '\n' line ends, keys in a fixed order, no timestamps or absolute
 * paths.
 */
public final class JsonReporter implements Reporter {

    /**
     * Bumped on any change of the report's shape or of a field's meaning (2.0: one set of balance
     * counts, {@code failOnSeverity} and {@code gate.failScope} renamed, protonation grouped per
     * model, structure-table findings located in the table; see {@code docs/reports.md}).
     */
    public static final String SCHEMA_VERSION = "2.0";

    @Override
    public ReportFormat format() {
        return ReportFormat.JSON;
    }

    @Override
    public Path write(RunResult result, Path directory) throws IOException {
        Path file = directory.resolve(ReportFormat.JSON.fileName());
        ReportFiles.write(file, JsonText.utf8(tree(result)));
        return file;
    }

    /** The report as a string, exactly the bytes {@link #write} puts in the file. */
    public String toJson(RunResult result) throws IOException {
        return JsonText.of(tree(result));
    }

    static Map<String, Object> tree(RunResult result) {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("schemaVersion", SCHEMA_VERSION);
        root.put("tool", SarifReporter.obj("name", "AtomLedger", "version", Version.get()));
        root.put("summary", summary(result));
        List<Object> models = new ArrayList<>();
        for (ModelResult m : result.models()) {
            models.add(model(m, result.gate()));
        }
        root.put("models", models);
        return root;
    }

    private static Map<String, Object> summary(RunResult result) {
        Map<String, Object> s = new LinkedHashMap<>();
        s.put("models", result.models().size());
        s.put("reactions", result.models().stream().mapToInt(m -> m.reactions().size()).sum());
        s.put("findings", severityCounts(result.allFindings()));
        s.put("failOnSeverity", result.config().failOn() == null ? "none" : result.config().failOn().label());
        s.put("failed", !result.failing().isEmpty());
        if (result.gate() != GateMarks.NONE) {
            s.put("gate", gate(result));
        }
        return s;
    }

    /** The release gate's summary: fail scope and baseline counts (present only when gating). */
    private static Map<String, Object> gate(RunResult result) {
        GateMarks g = result.gate();
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("failScope", g.onlyRules().isEmpty() ? "findings" : "regressions");
        if (g.hasBaseline()) {
            Map<String, Object> b = new LinkedHashMap<>();
            b.put("file", g.baselineFile());
            for (BaselineStatus st : BaselineStatus.values()) {
                b.put(st.label(), g.baseline().values().stream().filter(v -> v == st).count());
            }
            b.put("stale", result.allFindings().stream().filter(f -> f.ruleId().equals(BaselineMatch.STALE_RULE)).count());
            o.put("baseline", b);
        }
        return o;
    }

    static Map<String, Object> severityCounts(List<Finding> findings) {
        Map<String, Object> c = new LinkedHashMap<>();
        for (Severity sev : new Severity[] {Severity.ERROR, Severity.WARNING, Severity.INFO}) {
            c.put(sev.label(), findings.stream().filter(f -> f.severity() == sev).count());
        }
        return c;
    }

    private static Map<String, Object> model(ModelResult m, GateMarks gate) {
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("file", m.file());
        o.put("modelId", m.model().modelId());
        o.put("level", m.model().level());
        o.put("version", m.model().version());
        o.put("fbcVersion", m.model().fbcVersion());
        Map<String, Object> classes = new TreeMap<>();
        m.reactions().forEach(r -> classes.merge(r.reactionClass().label(), 1, (a, b) -> (Integer) a + (Integer) b));
        Map<String, Object> summary = new LinkedHashMap<>();
        summary.put("species", m.model().species().size());
        summary.put("reactions", m.reactions().size());
        summary.put("classes", classes);
        ModelCounts counts = ModelCounts.of(m);
        summary.put("elementImbalanced", counts.elements().imbalanced());
        summary.put("chargeImbalanced", counts.charge().imbalanced());
        summary.put("balance", counts.json());
        summary.put("findings", severityCounts(m.allFindings()));
        if (m.mapping().enabled()) {
            Map<String, Object> statuses = new TreeMap<>();
            m.reactions().forEach(r -> {
                if (r.mapping() != null) {
                    statuses.merge(r.mapping().status().label(), 1, (a, b) -> (Integer) a + (Integer) b);
                }
            });
            summary.put("mapping", statuses);
        } else {
            summary.put("mapping", null);
        }
        o.put("summary", summary);
        if (m.mapping().enabled()) {
            o.put("coverage", coverage(m));
        }
        o.put("findings", findings(m.modelFindings(), gate));
        List<Object> reactions = new ArrayList<>();
        for (ReactionResult r : m.reactions()) {
            reactions.add(reaction(r, gate, m.mapping().structures()));
        }
        o.put("reactions", reactions);
        return o;
    }

    /** Structure coverage (issue 15): documented in docs/report-schema.json, {@code $defs/coverage}. */
    private static Map<String, Object> coverage(ModelResult m) {
        Map<String, ReactionResult> byId = new LinkedHashMap<>();
        m.reactions().forEach(r -> byId.putIfAbsent(r.id(), r));
        Coverage c = Coverage.of(m.model(), m.mapping(), id -> byId.get(id).reactionClass());
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("considered", c.considered());
        o.put("mappable", c.mappable());
        o.put("blocked", c.blocked());
        o.put("blockedOnlyByGeneric", c.blockedByGenericOnly());
        o.put("sources", new TreeMap<>(c.sources()));
        List<Object> missing = new ArrayList<>();
        for (Coverage.Missing x : c.missing()) {
            Map<String, Object> e = new LinkedHashMap<>();
            e.put("species", x.species());
            e.put("unblocks", x.unblocks());
            e.put("blocks", x.blocks());
            e.put("reactions", x.reactions());
            missing.add(e);
        }
        o.put("missing", missing);
        List<Object> generic = new ArrayList<>();
        for (Coverage.Generic g : c.generic()) {
            Map<String, Object> e = new LinkedHashMap<>();
            e.put("species", g.species());
            e.put("reason", g.reason());
            e.put("blocks", g.blocks());
            generic.add(e);
        }
        o.put("generic", generic);
        return o;
    }

    private static Map<String, Object> reaction(ReactionResult r, GateMarks gate, SpeciesStructures structures) {
        Map<String, Object> o = new LinkedHashMap<>();
        ReactionBalance b = r.balance();
        o.put("id", r.id());
        o.put("name", r.reaction().name());
        o.put("line", r.reaction().line());
        o.put("class", b.reactionClass().label());
        o.put("classSource", b.classification().source());
        Map<String, Object> balance = new LinkedHashMap<>();
        balance.put("computable", b.elementsComputable());
        Map<String, String> elements = new TreeMap<>();
        if (b.elementsComputable()) {
            for (Map.Entry<String, Rational> e : b.elements().entrySet()) {
                elements.put(e.getKey(), e.getValue().toString());
            }
        }
        balance.put("elements", b.elementsComputable() ? elements : null);
        balance.put("charge", b.charge() == null ? null : b.charge().toString());
        o.put("balance", balance);
        o.put("mapping", r.mapping() == null ? null : mapping(r.mapping(), structures));
        o.put("findings", findings(r.findings(), gate));
        return o;
    }

    private static Map<String, Object> mapping(ReactionMapping m, SpeciesStructures structures) {
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("status", m.status().label());
        o.put("carbon", transitions(m.carbons(), structures));
        o.put("cost", m.cost() < 0 ? null : m.cost());
        o.put("lowerBound", m.lowerBound() < 0 ? null : m.lowerBound());
        List<Object> alternatives = new ArrayList<>();
        m.alternatives().forEach(a -> alternatives.add(transitions(a, structures)));
        o.put("alternatives", alternatives);
        o.put("mappedSmiles", m.mappedSmiles().isEmpty() ? null : m.mappedSmiles());
        o.put("stereoNotes", m.stereoNotes());
        o.put("reason", m.reason().isEmpty() ? null : m.reason());
        o.put("missingStructures", m.missingStructures());
        Map<String, String> diff = new TreeMap<>();
        m.elementDifference().forEach((k, v) -> diff.put(k, Long.toString(v)));
        o.put("elementDifference", diff);
        o.put("structures", new TreeMap<>(m.fingerprints()));
        o.putAll(ConfidenceFields.of(m.confidence(), structures));
        return o;
    }

    static List<Object> transitions(List<AtomTransition> list, SpeciesStructures structures) {
        List<Object> out = new ArrayList<>();
        for (AtomTransition t : list) {
            Map<String, Object> o = new LinkedHashMap<>();
            o.put("from", atom(t.from(), structures));
            o.put("to", atom(t.to(), structures));
            out.add(o);
        }
        return out;
    }

    static Map<String, Object> atom(AtomRef a, SpeciesStructures structures) {
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("species", a.species());
        o.put("copy", a.copy());
        o.put("atom", a.atom());
        // The readable position from the structure's atom class ("C3"), else the index as text (#14).
        o.put("label", structures.label(a.species(), a.atom()));
        return o;
    }

    static List<Object> findings(List<Finding> findings) {
        return findings(findings, GateMarks.NONE);
    }

    /** Findings with their {@code baseline} status when a baseline was applied. */
    static List<Object> findings(List<Finding> findings, GateMarks gate) {
        List<Object> out = new ArrayList<>();
        for (Finding f : findings) {
            Map<String, Object> o = new LinkedHashMap<>();
            o.put("ruleId", f.ruleId());
            o.put("severity", f.severity().label());
            o.put("modelFile", f.modelFile());
            o.put("elementId", f.elementId());
            o.put("line", f.line());
            o.put("message", f.message());
            o.put("data", new TreeMap<>(f.data()));
            gate.status(f).ifPresent(st -> o.put("baseline", st.label()));
            out.add(o);
        }
        return out;
    }

    static byte[] utf8(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }
}
