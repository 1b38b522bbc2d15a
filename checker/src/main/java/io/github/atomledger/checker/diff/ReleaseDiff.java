package io.github.atomledger.checker.diff;

import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.structure.SpeciesStructures;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.balance.Deltas;
import io.github.atomledger.checker.check.balance.ReactionBalance;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * Compares a model with its previous release, reaction by reaction (matched by id), and reports
 * what changed as findings on the current model:
 * <ul>
 * <li>{@value #ADDED} (info), {@value #REMOVED} (warning): reactions that appeared or went away;</li>
 * <li>{@value #REGRESSION} (error): for the elements or the charge of a reaction whose balance is
 *     checked: balanced before and imbalanced or unknown now; or imbalanced now and new, exempt or
 *     unknown before;</li>
 * <li>{@value #CHANGED} (warning): no regression, but imbalanced in both versions by a different
 *     amount;</li>
 * <li>{@value #FIXED} (info): neither of those, and imbalanced before, balanced now;</li>
 * <li>{@value #TRANSITIONS} (warning): both versions carry carbon transitions for the reaction and
 *     some carbon now goes elsewhere, or the previous version carried them and this one does not.</li>
 * </ul>
 * Findings have the rules' default severities; the caller applies the severity policy. Balance
 * states come from the checked results, so this compares what the checks computed, in exact
 * arithmetic. Pure, deterministic, thread-safe.
 *
 * <p>Does not handle: renamed reactions (a rename is one removal and one addition).
 */
public final class ReleaseDiff {

    public static final String ADDED = "model.reaction-added";
    public static final String REMOVED = "model.reaction-removed";
    public static final String REGRESSION = "balance.regression";
    public static final String CHANGED = "balance.imbalance-changed";
    public static final String FIXED = "balance.fixed";
    public static final String TRANSITIONS = "mapping.transitions-changed";

    /** Every rule of the release diff, with its default severity, sorted by rule id. */
    public static final Map<String, Severity> RULES = rules();

    /** At most this many moved carbons are named in a message; data lists them all. */
    static final int MESSAGE_ATOMS = 3;

    private ReleaseDiff() {
    }

    private static Map<String, Severity> rules() {
        Map<String, Severity> m = new TreeMap<>();
        m.put(ADDED, Severity.INFO);
        m.put(REMOVED, Severity.WARNING);
        m.put(REGRESSION, Severity.ERROR);
        m.put(CHANGED, Severity.WARNING);
        m.put(FIXED, Severity.INFO);
        m.put(TRANSITIONS, Severity.WARNING);
        return java.util.Collections.unmodifiableMap(m);
    }

    /** What a version says about one part (elements or charge) of a reaction's balance. */
    enum State {
        ABSENT("absent"), EXEMPT("exempt"), BALANCED("balanced"), IMBALANCED("imbalanced"), UNKNOWN("unknown");

        final String label;

        State(String label) {
            this.label = label;
        }

        static State elements(ReactionResult r) {
            State s = outside(r);
            if (s != null) {
                return s;
            }
            ReactionBalance b = r.balance();
            return !b.elementsComputable() ? UNKNOWN : b.elements().isEmpty() ? BALANCED : IMBALANCED;
        }

        static State charge(ReactionResult r) {
            State s = outside(r);
            if (s != null) {
                return s;
            }
            Rational c = r.balance().charge();
            return c == null ? UNKNOWN : c.isZero() ? BALANCED : IMBALANCED;
        }

        private static State outside(ReactionResult r) {
            if (r == null) {
                return ABSENT;
            }
            return r.balance().reactionClass().balanceComputed() ? null : EXEMPT;
        }

        /** Balanced before and imbalanced or unknown now; or imbalanced now and not known before. */
        static boolean regressed(State was, State now) {
            return (was == BALANCED && (now == IMBALANCED || now == UNKNOWN))
                    || (now == IMBALANCED && (was == ABSENT || was == EXEMPT || was == UNKNOWN));
        }
    }

    /**
     * Compares two versions of one model.
     *
     * @param previous        the previous release's result, or null when the model is new
     * @param current         the current result
     * @param previousCarbons carbon transitions of the previous version, by reaction id
     * @param currentCarbons  carbon transitions of the current version, by reaction id
     * @return findings on the current model file, sorted
     */
    public static List<Finding> compare(ModelResult previous, ModelResult current,
                                        Map<String, List<AtomTransition>> previousCarbons,
                                        Map<String, List<AtomTransition>> currentCarbons) {
        Map<String, ReactionResult> before = byId(previous);
        Map<String, ReactionResult> now = byId(current);
        List<Finding> out = new ArrayList<>();
        String file = current.file();
        for (ReactionResult r : now.values()) {
            ReactionResult p = before.get(r.id());
            if (p == null && previous != null) {
                out.add(finding(ADDED, file, r, "Reaction " + r.id() + " (" + r.reactionClass().label()
                        + ") is new in this release.", Map.of("class", r.reactionClass().label())));
            }
            balance(p, r, file).ifPresent(out::add);
            transitions(r, previousCarbons.get(r.id()), currentCarbons.get(r.id()), file,
                    current.mapping().structures()).ifPresent(out::add);
        }
        for (ReactionResult p : before.values()) {
            if (!now.containsKey(p.id())) {
                out.add(new Finding(REMOVED, RULES.get(REMOVED), file, p.id(), 0, "Reaction " + p.id() + " ("
                        + p.reactionClass().label() + ") of the previous release is gone.",
                        new TreeMap<>(Map.of("class", p.reactionClass().label()))));
            }
        }
        return out.stream().sorted(Finding.ORDER).toList();
    }

    private static java.util.Optional<Finding> balance(ReactionResult p, ReactionResult r, String file) {
        State wasElements = State.elements(p);
        State wasCharge = State.charge(p);
        State nowElements = State.elements(r);
        State nowCharge = State.charge(r);
        Map<String, String> data = new TreeMap<>();
        data.put("class", r.reactionClass().label());
        data.put("was.elements", wasElements.label);
        data.put("was.charge", wasCharge.label);
        data.put("now.elements", nowElements.label);
        data.put("now.charge", nowCharge.label);
        deltas(r.balance(), "delta.", data);
        if (wasElements == State.IMBALANCED || wasCharge == State.IMBALANCED) {
            deltas(p.balance(), "previous.delta.", data);
        }
        String id = r.id();
        String before = "elements " + wasElements.label + ", charge " + wasCharge.label;
        if (State.regressed(wasElements, nowElements) || State.regressed(wasCharge, nowCharge)) {
            return java.util.Optional.of(finding(REGRESSION, file, r, "Reaction " + id + " regressed: "
                    + describe(r.balance()) + " in this release (before: " + before + ").", data));
        }
        boolean differs = (wasElements == State.IMBALANCED && nowElements == State.IMBALANCED
                && !p.balance().elements().equals(r.balance().elements()))
                || (wasCharge == State.IMBALANCED && nowCharge == State.IMBALANCED
                && !p.balance().charge().equals(r.balance().charge()));
        if (differs) {
            return java.util.Optional.of(finding(CHANGED, file, r, "Reaction " + id + " is off by "
                    + describe(r.balance()) + " in this release instead of " + describe(p.balance()) + ".", data));
        }
        if ((wasElements == State.IMBALANCED && nowElements == State.BALANCED)
                || (wasCharge == State.IMBALANCED && nowCharge == State.BALANCED)) {
            return java.util.Optional.of(finding(FIXED, file, r, "Reaction " + id + " was off by " + describe(p.balance())
                    + " before; in this release: " + describe(r.balance()) + ".", data));
        }
        return java.util.Optional.empty();
    }

    private static java.util.Optional<Finding> transitions(ReactionResult r, List<AtomTransition> before,
                                                           List<AtomTransition> now, String file,
                                                           SpeciesStructures names) {
        if (before == null || before.isEmpty()) {
            return java.util.Optional.empty();
        }
        Map<AtomRef, AtomRef> was = targets(before);
        Map<AtomRef, AtomRef> is = now == null ? Map.of() : targets(now);
        Set<AtomRef> sources = new TreeSet<>(was.keySet());
        sources.addAll(is.keySet());
        Map<String, String> data = new TreeMap<>();
        List<String> named = new ArrayList<>();
        for (AtomRef from : sources) {
            String a = was.containsKey(from) ? was.get(from).toString() : "none";
            String b = is.containsKey(from) ? is.get(from).toString() : "none";
            if (!a.equals(b)) {
                data.put("moved." + from, a + " -> " + b);
                if (named.size() < MESSAGE_ATOMS) {
                    // Messages name atoms by their readable labels (the current structures'); data keeps indices.
                    named.add(names.name(from) + " to " + (is.containsKey(from) ? names.name(is.get(from)) : "none")
                            + " instead of " + (was.containsKey(from) ? names.name(was.get(from)) : "none"));
                }
            }
        }
        if (data.isEmpty()) {
            return java.util.Optional.empty();
        }
        int moved = data.size();
        data.put("moved", Integer.toString(moved));
        data.put("now", is.isEmpty() ? "none" : "mapped");
        String message = is.isEmpty()
                ? "Reaction " + r.id() + " had carbon transitions in the previous release and has none now."
                : "Reaction " + r.id() + "'s carbon transitions changed: " + moved + " carbon(s) now go elsewhere ("
                + String.join("; ", named) + (moved > named.size() ? "; ..." : "") + ").";
        return java.util.Optional.of(finding(TRANSITIONS, file, r, message, data));
    }

    private static Map<AtomRef, AtomRef> targets(List<AtomTransition> transitions) {
        Map<AtomRef, AtomRef> m = new TreeMap<>();
        for (AtomTransition t : transitions) {
            if (t.element().equals("C")) {
                m.put(t.from(), t.to());
            }
        }
        return m;
    }

    private static void deltas(ReactionBalance b, String prefix, Map<String, String> data) {
        if (b.elementsComputable()) {
            for (Map.Entry<String, Rational> e : b.elements().entrySet()) {
                data.put(prefix + e.getKey(), e.getValue().toString());
            }
        }
        if (b.charge() != null && !b.charge().isZero()) {
            data.put(prefix + "charge", b.charge().toString());
        }
    }

    /** "H -1, charge -1" style text of an imbalance ("elements unknown", "charge unknown"; "balanced"). */
    static String describe(ReactionBalance b) {
        List<String> parts = new ArrayList<>();
        if (!b.elementsComputable()) {
            parts.add("elements unknown");
        } else if (!b.elements().isEmpty()) {
            parts.add(Deltas.format(b.elements()));
        }
        if (b.charge() == null) {
            parts.add("charge unknown");
        } else if (!b.charge().isZero()) {
            parts.add("charge " + Deltas.signed(b.charge()));
        }
        return parts.isEmpty() ? "balanced" : String.join(", ", parts);
    }

    private static Finding finding(String rule, String file, ReactionResult r, String message, Map<String, String> data) {
        return new Finding(rule, RULES.get(rule), file, r.id(), r.reaction().line(), message, new TreeMap<>(data));
    }

    private static Map<String, ReactionResult> byId(ModelResult m) {
        Map<String, ReactionResult> out = new LinkedHashMap<>();
        if (m != null) {
            m.reactions().forEach(r -> out.putIfAbsent(r.id(), r));
        }
        return out;
    }
}
