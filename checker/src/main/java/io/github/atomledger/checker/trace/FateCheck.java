package io.github.atomledger.checker.trace;

import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;

/**
 * Compares declared fates with the traces and turns the result into findings of the {@code trace.}
 * area: {@code trace.fate-differs} (the carbon ends elsewhere; names the first step where actual
 * and expected part), {@code trace.fate-undecided} (the maps do not say), {@code trace.expectation-invalid}
 * (a fates line names a carbon, species or position that does not exist) and
 * {@code trace.pathway-invalid} (a pathway whose source or steps the model lacks). Findings are
 * about the source species (the model id when the model lacks it). Pure and deterministic.
 */
public final class FateCheck {

    public static final String DIFFERS = "trace.fate-differs";
    public static final String UNDECIDED = "trace.fate-undecided";
    public static final String EXPECTATION_INVALID = "trace.expectation-invalid";
    public static final String PATHWAY_INVALID = "trace.pathway-invalid";

    /** The rule ids with their default severities. */
    public static final Map<String, Severity> RULES = rules();

    /** One line of user documentation per rule id. */
    public static final Map<String, String> DESCRIPTIONS = Map.of(
            DIFFERS, "A declared carbon fate does not hold: the carbon ends elsewhere.",
            UNDECIDED, "The atom maps do not say where the carbon of a declared fate ends.",
            EXPECTATION_INVALID, "A declared fate names a carbon, species or position that does not exist.",
            PATHWAY_INVALID, "A pathway's source or steps are missing from the model, or its source has no structure.");

    private static Map<String, Severity> rules() {
        Map<String, Severity> m = new LinkedHashMap<>();
        m.put(DIFFERS, Severity.ERROR);
        m.put(UNDECIDED, Severity.WARNING);
        m.put(EXPECTATION_INVALID, Severity.ERROR);
        m.put(PATHWAY_INVALID, Severity.ERROR);
        return java.util.Collections.unmodifiableMap(m);
    }

    private FateCheck() {
    }

    /** The outcome of each expectation whose pathway was traced in this model, in file order. */
    static List<FateOutcome> outcomes(ModelView model, Map<String, PathwayTrace> traces, List<FateExpectation> expected,
                                      Atoms atoms) {
        List<FateOutcome> out = new ArrayList<>();
        for (FateExpectation e : expected) {
            PathwayTrace t = traces.get(e.pathway());
            if (t != null && !t.carbons().isEmpty()) {
                out.add(outcome(model, t, e, atoms));
            }
        }
        return out;
    }

    private static FateOutcome outcome(ModelView model, PathwayTrace t, FateExpectation e, Atoms atoms) {
        String source = t.pathway().source();
        Structure s = atoms.structures().get(source).orElseThrow().structure();
        int atom = s.atomNamed(e.carbon());
        CarbonTrace c = atom == 0 ? null : t.carbon(atom);
        if (c == null) {
            return invalid(e, "", "names carbon " + e.carbon() + ", which " + source + " does not have");
        }
        String label = s.atomLabel(atom);
        if (model.species(e.species()).isEmpty()) {
            return invalid(e, label, "names " + e.species() + ", which is not a species of the model");
        }
        int position = e.position().isEmpty() ? 0
                : atoms.structures().get(e.species()).map(r -> r.structure().atomNamed(e.position())).orElse(0);
        if (!e.position().isEmpty()) {
            if (position == 0) {
                return invalid(e, label, "names position " + e.position() + ", which " + e.species() + " does not have"
                        + (atoms.atomCount(e.species()) == 0 ? " a structure for" : ""));
            }
        }
        if (c.status() == CarbonStatus.UNDECIDED) {
            return new FateOutcome(e, FateOutcome.Verdict.UNDECIDED, label, "", c.stopStep(),
                    stepText(t, c.stopStep()), c.reason());
        }
        Set<Position> at = c.positions().keySet();
        long matching = at.stream().filter(p -> matches(p, e.species(), position)).count();
        boolean holds = position == 0 ? matching == at.size()
                : matching > 0 && atoms.classes(at) == 1 && at.iterator().next().species().equals(e.species());
        String actual = atoms.text(at);
        if (holds) {
            return new FateOutcome(e, FateOutcome.Verdict.HOLDS, label, actual, 0, "", "");
        }
        if (matching > 0) {
            return new FateOutcome(e, FateOutcome.Verdict.UNDECIDED, label, actual, c.lastMove(),
                    stepText(t, c.lastMove()), c.reason());
        }
        Parting part = parting(t, c, e.species(), position);
        return new FateOutcome(e, FateOutcome.Verdict.DIFFERS, label, actual, part.step(), stepText(t, part.step()),
                part.hint());
    }

    private static boolean matches(Position p, String species, int position) {
        return p.species().equals(species) && (position == 0 || p.atom() == position);
    }

    /** Where actual and expected part: the 1-based step (0: the carbon never moved) and a hint, "" when none. */
    record Parting(int step, String hint) {
    }

    /**
     * The first step where actual and expected part: the step that moved the carbon away after it
     * last sat where expected; else the first step that moved it and makes the expected species;
     * else the first later step that has the carbon's species on the side it makes (it does not
     * take the carbon up: most likely it should run backwards); else the step of its fate, where
     * it went into a species no later step consumes (0 when it never moved).
     */
    static Parting parting(PathwayTrace t, CarbonTrace c, String species, int position) {
        String source = t.pathway().source();
        int lastThere = -1;
        for (int k = 0; k <= t.pathway().steps().size(); k++) {
            Set<Position> at = c.after(k, source).keySet();
            if (at.stream().allMatch(p -> matches(p, species, position))) {
                lastThere = k;
            }
        }
        if (lastThere >= 0) {
            for (CarbonTrace.Hop h : c.path()) {
                if (h.index() > lastThere) {
                    return new Parting(h.index(), "");
                }
            }
        }
        for (CarbonTrace.Hop h : c.path()) {
            if (t.steps().get(h.index() - 1).to().contains(species)) {
                return new Parting(h.index(), "");
            }
        }
        Set<String> where = new java.util.TreeSet<>();
        c.positions().keySet().forEach(p -> where.add(p.species()));
        for (int j = c.lastMove() + 1; j <= t.steps().size(); j++) {
            StepUse u = t.steps().get(j - 1);
            for (String w : where) {
                if (u.to().contains(w) && !u.from().contains(w)) {
                    Step reversed = new Step(u.step().reactionId(), !u.step().backwards());
                    return new Parting(j, u.step().reactionId() + " makes " + w + " instead of consuming it (write "
                            + reversed.text() + " to run it the other way)");
                }
            }
        }
        return new Parting(c.lastMove(), "");
    }

    private static String stepText(PathwayTrace t, int step) {
        return step <= 0 ? "" : t.pathway().steps().get(step - 1).text();
    }

    private static FateOutcome invalid(FateExpectation e, String label, String why) {
        return new FateOutcome(e, FateOutcome.Verdict.INVALID, label, "", 0, "", why);
    }

    /** The findings of the outcomes that do not hold, and of pathways with problems. */
    static List<Finding> findings(ModelView model, List<PathwayTrace> traces, List<FateOutcome> outcomes) {
        List<Finding> out = new ArrayList<>();
        Map<String, PathwayTrace> byName = new LinkedHashMap<>();
        traces.forEach(t -> byName.put(t.pathway().name(), t));
        for (PathwayTrace t : traces) {
            if (t.problems().isEmpty()) {
                continue;
            }
            Map<String, String> data = new TreeMap<>();
            data.put("pathway", t.pathway().name());
            data.put("source", t.pathway().source());
            data.put("definition", t.pathway().where());
            data.put("problems", String.join("; ", t.problems()));
            out.add(finding(model, PATHWAY_INVALID, t.pathway().source(), "Pathway " + t.pathway().name() + " ("
                    + t.pathway().where() + ") cannot be followed as written: " + String.join("; ", t.problems()) + ".", data));
        }
        for (FateOutcome o : outcomes) {
            FateExpectation e = o.expectation();
            String source = byName.get(e.pathway()).pathway().source();
            Map<String, String> data = new TreeMap<>();
            data.put("pathway", e.pathway());
            data.put("carbon", o.carbon().isEmpty() ? e.carbon() : o.carbon());
            data.put("source", source);
            data.put("expected", e.fateText());
            data.put("expectation", e.where());
            String head = "Pathway " + e.pathway() + ": ";
            String step = o.step() == 0 ? "" : "step " + o.step() + ", " + o.stepText();
            switch (o.verdict()) {
                case HOLDS -> {
                }
                case INVALID -> {
                    data.put("problem", o.detail());
                    out.add(finding(model, EXPECTATION_INVALID, source, head + "the expectation at " + e.where() + " "
                            + o.detail() + ".", data));
                }
                case UNDECIDED -> {
                    data.put("actual", o.actual().isEmpty() ? "undecided" : o.actual());
                    data.put("reason", o.detail());
                    data.put("step", o.stepText());
                    data.put("stepIndex", Integer.toString(o.step()));
                    out.add(finding(model, UNDECIDED, source, head + "the fate of carbon " + o.carbon() + " of " + source
                            + " is undecided, so " + e.fateText() + " (" + e.where() + ") cannot be confirmed: "
                            + o.detail() + ".", data));
                }
                case DIFFERS -> {
                    data.put("actual", o.actual());
                    data.put("step", o.stepText());
                    data.put("stepIndex", Integer.toString(o.step()));
                    if (!o.detail().isEmpty()) {
                        data.put("hint", o.detail());
                    }
                    out.add(finding(model, DIFFERS, source, head + "carbon " + o.carbon() + " of " + source + " ends in "
                            + o.actual() + ", not in " + e.fateText() + " as expected (" + e.where() + "); "
                            + (step.isEmpty() ? "it never leaves " + source : "they part at " + step)
                            + (o.detail().isEmpty() ? "" : ": " + o.detail()) + ".", data));
                }
            }
        }
        return out;
    }

    private static Finding finding(ModelView model, String rule, String species, String message, Map<String, String> data) {
        SpeciesInfo s = model.species(species).orElse(null);
        String element = s != null ? species : model.modelId().isEmpty() ? model.file() : model.modelId();
        return new Finding(rule, RULES.get(rule), model.file(), element, s == null ? 0 : s.line(), message, new TreeMap<>(data));
    }
}
