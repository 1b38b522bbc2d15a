package io.github.atomledger.checker.engine;

import io.github.atomledger.atommapper.mapping.AtomMapper;
import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.atommapper.mapping.MapConfidence;
import io.github.atomledger.atommapper.mapping.MappingResult;
import io.github.atomledger.atommapper.mapping.MappingStatus;
import io.github.atomledger.atommapper.mapping.Participant;
import io.github.atomledger.atommapper.mapping.ReactionInput;
import io.github.atomledger.atommapper.structure.MoleculeGraph;
import io.github.atomledger.checker.check.mapping.CuratedVerdict;
import io.github.atomledger.checker.check.mapping.ReactionMapping;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * Judges a curated carbon map: first that it is a carbon map at all (every atom exists and is a
 * carbon; every carbon of every substrate copy goes to exactly one product carbon and every
 * product carbon comes from exactly one), then how it compares with the inferred optimum (equal up
 * to symmetry, or how many more weighted bond edits it needs, found by re-solving with the curated
 * transitions pinned).
 */
final class CuratedMaps {

    private CuratedMaps() {
    }

    static CuratedVerdict judge(AtomMapper mapper, ReactionInput input, ReactionMapping optimum, List<AtomTransition> curated) {
        return judge(mapper, input, optimum, curated, MapConfidence.DEFAULT_REVIEW_MARGIN);
    }

    /**
     * As {@link #judge(AtomMapper, ReactionInput, ReactionMapping, List)}, and a valid map that
     * differs is "criterion undecided" (accepted) when it costs at most {@code reviewMargin} more
     * than the optimum, or, for a map that calls for review (a rearrangement pattern or a fate
     * that depends on the weights), at most one moved C–C bond more: the price of the 1,2-shift
     * the criterion is known to miss.
     */
    static CuratedVerdict judge(AtomMapper mapper, ReactionInput input, ReactionMapping optimum,
                                List<AtomTransition> curated, int reviewMargin) {
        List<String> problems = validate(input, curated);
        if (!problems.isEmpty()) {
            return new CuratedVerdict(input.reactionId(), problems, false, -1, List.of());
        }
        if (!optimum.hasMap()) {
            return new CuratedVerdict(input.reactionId(), List.of(), false, -1, List.of());
        }
        if (AtomMapper.sameUpToSymmetry(input, curated, optimum.carbons())) {
            return new CuratedVerdict(input.reactionId(), List.of(), true, 0, List.of());
        }
        for (List<AtomTransition> alt : optimum.alternatives()) {
            if (AtomMapper.sameUpToSymmetry(input, curated, alt)) {
                return new CuratedVerdict(input.reactionId(), List.of(), true, 0, List.of());
            }
        }
        MappingResult pinned = mapper.map(input, curated);
        int extra = pinned.status() == MappingStatus.UNMAPPABLE || pinned.cost() < 0 || optimum.cost() < 0
                ? -1 : pinned.cost() - optimum.cost();
        Set<String> optimal = new HashSet<>();
        optimum.carbons().forEach(t -> optimal.add(t.from() + ">" + t.to()));
        List<AtomTransition> differing = curated.stream().filter(t -> !optimal.contains(t.from() + ">" + t.to())).toList();
        // A narrow margin alone does not stretch the acceptance: only a pattern or a weight-dependent fate does.
        boolean flagged = optimum.confidence().reviewReasons(reviewMargin).stream()
                .anyMatch(reason -> reason != MapConfidence.Reason.MARGIN);
        boolean undecided = extra >= 0 && (extra <= reviewMargin
                || flagged && extra <= 2 * mapper.options().carbonCarbonWeight());
        return new CuratedVerdict(input.reactionId(), List.of(), false, extra, differing, undecided);
    }

    static List<String> validate(ReactionInput input, List<AtomTransition> map) {
        List<String> problems = new ArrayList<>();
        Map<String, Participant> reactants = byId(input.reactants());
        Map<String, Participant> products = byId(input.products());
        Set<AtomRef> from = new HashSet<>();
        Set<AtomRef> to = new HashSet<>();
        for (AtomTransition t : map) {
            check(t.from(), reactants, "substrate", problems);
            check(t.to(), products, "product", problems);
            if (!from.add(t.from())) {
                problems.add("substrate atom " + t.from() + " is mapped twice");
            }
            if (!to.add(t.to())) {
                problems.add("product atom " + t.to() + " receives two atoms");
            }
        }
        for (AtomRef c : carbons(input.reactants())) {
            if (!from.contains(c)) {
                problems.add("substrate carbon " + c + " is not mapped");
            }
        }
        for (AtomRef c : carbons(input.products())) {
            if (!to.contains(c)) {
                problems.add("product carbon " + c + " receives no atom");
            }
        }
        return problems.size() > 20 ? List.copyOf(new ArrayList<>(problems.subList(0, 20))) : problems;
    }

    private static void check(AtomRef a, Map<String, Participant> side, String what, List<String> problems) {
        Participant p = side.get(a.species());
        if (p == null) {
            problems.add(a + " names no " + what + " of the reaction");
            return;
        }
        if (a.copy() > p.coefficient()) {
            problems.add(a + ": the reaction has only " + p.coefficient() + " cop" + (p.coefficient() == 1 ? "y" : "ies")
                    + " of " + a.species());
            return;
        }
        MoleculeGraph g = p.structure().graph();
        if (a.atom() > g.atomCount()) {
            problems.add(a + ": " + a.species() + " has only " + g.atomCount() + " heavy atoms");
        } else if (!g.element(a.atom() - 1).equals("C")) {
            problems.add(a + " is " + g.element(a.atom() - 1) + ", not a carbon");
        }
    }

    private static Map<String, Participant> byId(List<Participant> side) {
        Map<String, Participant> m = new HashMap<>();
        side.forEach(p -> m.put(p.species(), p));
        return m;
    }

    private static TreeSet<AtomRef> carbons(List<Participant> side) {
        TreeSet<AtomRef> out = new TreeSet<>();
        for (Participant p : side) {
            MoleculeGraph g = p.structure().graph();
            for (int copy = 1; copy <= p.coefficient(); copy++) {
                for (int i = 0; i < g.atomCount(); i++) {
                    if (g.element(i).equals("C")) {
                        out.add(new AtomRef(p.species(), copy, i + 1));
                    }
                }
            }
        }
        return out;
    }
}
