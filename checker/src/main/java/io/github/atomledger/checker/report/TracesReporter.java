package io.github.atomledger.checker.report;

import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.check.structure.SpeciesStructures;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReportFormat;
import io.github.atomledger.checker.engine.RunResult;
import io.github.atomledger.checker.trace.CarbonStatus;
import io.github.atomledger.checker.trace.CarbonTrace;
import io.github.atomledger.checker.trace.FateOutcome;
import io.github.atomledger.checker.trace.PathwayTrace;
import io.github.atomledger.checker.trace.Position;
import io.github.atomledger.checker.trace.StepUse;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * Writes {@code traces.json} (with the JSON format, when some model has traced pathways): the
 * machine interface of the carbon traces, documented in {@code docs/traces-schema.json}. A
 * top-level {@code traces} list; each trace has {@code model}, {@code pathway}, {@code source},
 * {@code steps} and {@code carbons}; each carbon has {@code atom} (heavy-atom index in the source),
 * {@code label}, {@code status} and {@code fate} ({@code species}, {@code atom}, {@code label},
 * {@code step}), its {@code path}, and for undecided carbons the step and reason. Byte-stable. A
 * run without traces removes an earlier run's file, so the directory never shows stale traces.
 */
final class TracesReporter implements Reporter {

    static final String FILE = "traces.json";

    @Override
    public ReportFormat format() {
        return ReportFormat.JSON;
    }

    /** Writes the file; returns null (and removes an old file) when nothing was traced. */
    @Override
    public Path write(RunResult result, Path directory) throws IOException {
        boolean none = result.models().stream().allMatch(m -> m.traces().pathways().isEmpty());
        return ReportFiles.writeJsonOrRemove(directory.resolve(FILE), none ? null : tree(result));
    }

    static Map<String, Object> tree(RunResult result) {
        List<Object> traces = new ArrayList<>();
        for (ModelResult m : result.models()) {
            for (PathwayTrace t : m.traces().pathways()) {
                traces.add(trace(m, t));
            }
        }
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("traces", traces);
        return root;
    }

    private static Map<String, Object> trace(ModelResult m, PathwayTrace t) {
        SpeciesStructures s = m.mapping().structures();
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("model", m.file());
        o.put("pathway", t.pathway().name());
        o.put("source", t.pathway().source());
        o.put("definition", t.pathway().where());
        List<Object> steps = new ArrayList<>();
        for (StepUse u : t.steps()) {
            Map<String, Object> st = new LinkedHashMap<>();
            st.put("step", u.step().text());
            st.put("reaction", u.step().reactionId());
            st.put("backwards", u.step().backwards());
            st.put("map", u.unusable() != null ? "none" : u.curated() ? "curated" : "inferred");
            st.put("note", u.unusable());
            steps.add(st);
        }
        o.put("steps", steps);
        o.put("problems", t.problems());
        o.put("summary", TraceSummary.line(m.model(), m.traces(), t));
        List<Object> carbons = new ArrayList<>();
        for (CarbonTrace c : t.carbons()) {
            carbons.add(carbon(s, t, c));
        }
        o.put("carbons", carbons);
        List<Object> expectations = new ArrayList<>();
        for (FateOutcome e : m.traces().outcomes(t.pathway().name())) {
            Map<String, Object> x = new LinkedHashMap<>();
            x.put("carbon", e.carbon().isEmpty() ? e.expectation().carbon() : e.carbon());
            x.put("expected", e.expectation().fateText());
            x.put("verdict", e.verdict().label());
            x.put("actual", e.actual().isEmpty() ? null : e.actual());
            x.put("step", e.stepText().isEmpty() ? null : e.stepText());
            x.put("stepIndex", e.step());
            x.put("detail", e.detail().isEmpty() ? null : e.detail());
            x.put("line", e.expectation().where());
            expectations.add(x);
        }
        o.put("expectations", expectations);
        return o;
    }

    private static Map<String, Object> carbon(SpeciesStructures s, PathwayTrace t, CarbonTrace c) {
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("atom", c.atom());
        o.put("label", s.label(t.pathway().source(), c.atom()));
        o.put("status", c.status().label());
        if (c.status() == CarbonStatus.UNDECIDED) {
            o.put("fate", null);
            Map<String, Object> u = new LinkedHashMap<>();
            u.put("step", t.pathway().steps().get(c.stopStep() - 1).text());
            u.put("stepIndex", c.stopStep());
            u.put("reason", c.reason());
            o.put("undecided", u);
            o.put("lastKnown", positions(s, c.positions()));
        } else {
            Map<String, Object> f = new LinkedHashMap<>();
            String species = c.fateSpecies().orElse(null);
            boolean one = c.status() == CarbonStatus.DECIDED;
            Position first = c.positions().firstKey();
            int atom = one ? lowestClass(s, c) : 0;
            f.put("species", species);
            f.put("atom", one ? atom : null);
            f.put("label", one ? s.label(first.species(), atom) : null);
            f.put("step", c.lastMove() == 0 ? null : t.pathway().steps().get(c.lastMove() - 1).text());
            f.put("stepIndex", c.lastMove());
            List<String> equivalent = new ArrayList<>();
            if (one) {
                c.positions().keySet().stream().filter(p -> p.atom() != atom)
                        .forEach(p -> equivalent.add(s.label(p.species(), p.atom())));
            }
            f.put("equivalent", equivalent);
            f.put("positions", positions(s, c.positions()));
            o.put("fate", f);
            o.put("reason", c.reason().isEmpty() ? null : c.reason());
        }
        List<Object> path = new ArrayList<>();
        for (CarbonTrace.Hop h : c.path()) {
            Map<String, Object> p = new LinkedHashMap<>();
            p.put("stepIndex", h.index());
            p.put("step", h.step().text());
            p.put("positions", positions(s, h.positions()));
            path.add(p);
        }
        o.put("path", path);
        return o;
    }

    /** The atom of a decided fate that reports name: the lowest atom class (else the lowest index). */
    private static int lowestClass(SpeciesStructures s, CarbonTrace c) {
        String species = c.positions().firstKey().species();
        return c.positions().keySet().stream().map(Position::atom)
                .min(java.util.Comparator.comparingInt((Integer a) -> io.github.atomledger.checker.trace.PositionText
                        .classOf(s, species, a)).thenComparingInt(a -> a)).orElseThrow();
    }

    static List<Object> positions(SpeciesStructures s, SortedMap<Position, Rational> at) {
        List<Object> out = new ArrayList<>();
        at.forEach((p, w) -> {
            Map<String, Object> o = new LinkedHashMap<>();
            o.put("species", p.species());
            o.put("atom", p.atom());
            o.put("label", s.label(p.species(), p.atom()));
            o.put("share", w.toString());
            out.add(o);
        });
        return out;
    }

}
