package io.github.atomledger.checker.report;

import io.github.atomledger.atommapper.depict.TracedStepPicture;
import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.checker.check.structure.SpeciesStructures;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.model.Participant;
import io.github.atomledger.checker.model.ReactionInfo;
import io.github.atomledger.checker.trace.CarbonTrace;
import io.github.atomledger.checker.trace.PathwayTrace;
import io.github.atomledger.checker.trace.Position;
import io.github.atomledger.checker.trace.PositionText;
import io.github.atomledger.checker.trace.StepUse;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeSet;

/**
 * Builds the drawing of one pathway step (atom-mapper's {@link TracedStepPicture}): the molecules
 * the step consumes on the left, the ones it makes on the right, each source carbon in its own
 * colour key with its label on the atoms that carry it before and after the step (every copy of a
 * species and every equivalent atom, since the trace cannot tell them apart), the rest muted.
 * Only molecules that carry a followed carbon are drawn; the report names the other participants.
 * A step that moves no followed carbon is not drawn.
 */
final class TracePictures {

    private TracePictures() {
    }

    /** Colour key per source carbon (1-based), in label order: a carbon keeps its key in every step. */
    static Map<Integer, Integer> keys(ModelResult m, PathwayTrace t) {
        Map<Integer, Integer> out = new LinkedHashMap<>();
        String source = t.pathway().source();
        List<Integer> atoms = new ArrayList<>(t.carbons().stream().map(CarbonTrace::atom).toList());
        atoms.sort(Comparator.comparingInt((Integer a) -> PositionText.classOf(m.mapping().structures(), source, a))
                .thenComparingInt(a -> a));
        atoms.forEach(a -> out.put(a, out.size() + 1));
        return out;
    }

    /** The step's SVG, or empty when the step has no map to draw. */
    static Optional<String> svg(ModelResult m, PathwayTrace t, int index, Map<Integer, Integer> keys) {
        StepUse use = t.steps().get(index - 1);
        ReactionInfo r = m.model().reactions().stream().filter(x -> x.id().equals(use.step().reactionId()))
                .findFirst().orElse(null);
        if (r == null || use.unusable() != null) {
            return Optional.empty();
        }
        SpeciesStructures s = m.mapping().structures();
        String source = t.pathway().source();
        boolean back = use.step().backwards();
        Map<Position, TreeSet<Integer>> before = new HashMap<>();
        Map<Position, TreeSet<Integer>> after = new HashMap<>();
        for (CarbonTrace c : t.carbons()) {
            boolean movedHere = c.path().stream().anyMatch(h -> h.index() == index) || c.stopStep() == index;
            if (!movedHere) {
                continue;
            }
            int key = keys.get(c.atom());
            c.after(index - 1, source).keySet().stream().filter(p -> use.from().contains(p.species()))
                    .forEach(p -> before.computeIfAbsent(p, k -> new TreeSet<>()).add(key));
            c.path().stream().filter(h -> h.index() == index).findFirst().ifPresent(h -> h.positions().keySet().stream()
                    .filter(p -> use.to().contains(p.species()))
                    .forEach(p -> after.computeIfAbsent(p, k -> new TreeSet<>()).add(key)));
        }
        Map<Integer, String> labelOfKey = new HashMap<>();
        keys.forEach((atom, key) -> labelOfKey.put(key, s.label(source, atom)));
        Map<AtomRef, AtomRef> cameFrom = new HashMap<>();
        for (AtomTransition tr : use.carbons()) {
            cameFrom.put(back ? tr.from() : tr.to(), back ? tr.to() : tr.from());
        }
        Map<AtomRef, Integer> numbers = new HashMap<>();
        List<TracedStepPicture.Molecule> left = side(m, back ? r.products() : r.reactants(), before, labelOfKey,
                (ref, n) -> numbers.put(ref, n), null);
        List<TracedStepPicture.Molecule> right = side(m, back ? r.reactants() : r.products(), after, labelOfKey,
                null, ref -> cameFrom.containsKey(ref) ? numbers.getOrDefault(cameFrom.get(ref), 0) : 0);
        if (left == null || right == null) {
            return Optional.empty();
        }
        List<TracedStepPicture.Molecule> shownLeft = carriers(left);
        List<TracedStepPicture.Molecule> shownRight = carriers(right);
        if (shownLeft.isEmpty() && shownRight.isEmpty()) {
            return Optional.empty();
        }
        java.util.Set<Integer> shownNumbers = new java.util.HashSet<>();
        shownLeft.forEach(mol -> java.util.Arrays.stream(mol.mapNumbers()).forEach(shownNumbers::add));
        List<TracedStepPicture.Molecule> alignedRight = new ArrayList<>();
        for (TracedStepPicture.Molecule mol : shownRight) {
            int[] n = mol.mapNumbers();
            for (int i = 0; i < n.length; i++) {
                n[i] = shownNumbers.contains(n[i]) ? n[i] : 0;
            }
            alignedRight.add(new TracedStepPicture.Molecule(mol.structure(), mol.title(), n, mol.keys(), mol.labels()));
        }
        return Optional.of(TracedStepPicture.of(r.id(), shownLeft, alignedRight).svg());
    }

    /** The molecules that carry a followed carbon: the others (cofactors, co-substrates) are listed, not drawn. */
    private static List<TracedStepPicture.Molecule> carriers(List<TracedStepPicture.Molecule> side) {
        return side.stream().filter(mol -> java.util.Arrays.stream(mol.keys()).anyMatch(k -> k > 0)).toList();
    }

    private static List<TracedStepPicture.Molecule> side(ModelResult m, List<Participant> participants,
                                                         Map<Position, TreeSet<Integer>> keyed, Map<Integer, String> labelOfKey,
                                                         java.util.function.BiConsumer<AtomRef, Integer> numbered,
                                                         java.util.function.ToIntFunction<AtomRef> numberOf) {
        Map<String, Integer> copies = new LinkedHashMap<>();
        for (Participant p : participants) {
            copies.merge(p.species(), copiesOf(p), Integer::sum);
        }
        List<TracedStepPicture.Molecule> out = new ArrayList<>();
        int next = 1;
        for (Map.Entry<String, Integer> e : copies.entrySet()) {
            Structure st = m.mapping().structures().get(e.getKey()).map(SpeciesStructures.Resolved::structure).orElse(null);
            if (st == null) {
                return null;
            }
            int n = st.heavyAtomCount();
            String title = TraceSummary.name(m.model(), e.getKey());
            for (int copy = 1; copy <= e.getValue(); copy++) {
                int[] numbers = new int[n];
                int[] keys = new int[n];
                String[] labels = new String[n];
                for (int a = 1; a <= n; a++) {
                    AtomRef ref = new AtomRef(e.getKey(), copy, a);
                    if (numbered != null) {
                        numbers[a - 1] = next;
                        numbered.accept(ref, next++);
                    } else {
                        numbers[a - 1] = numberOf.applyAsInt(ref);
                    }
                    TreeSet<Integer> k = keyed.get(new Position(e.getKey(), a));
                    if (k != null) {
                        keys[a - 1] = k.first();
                        labels[a - 1] = String.join("/", k.stream().map(labelOfKey::get).toList());
                    }
                }
                out.add(new TracedStepPicture.Molecule(st, title, numbers, keys, labels));
            }
        }
        return out;
    }

    /** The participant's whole coefficient, 1 when it is not a small positive whole number. */
    private static int copiesOf(Participant p) {
        try {
            Rational c = p.stoichiometryText() == null ? Rational.ONE : Rational.parse(p.stoichiometryText());
            return c.isInteger() && c.signum() > 0 && c.numerator().bitLength() < 8 ? c.numerator().intValue() : 1;
        } catch (NumberFormatException | ArithmeticException e) {
            return 1;
        }
    }

}
