package io.github.atomledger.atommapper.ctfile;

import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.atommapper.mapping.Participant;
import io.github.atomledger.atommapper.mapping.ReactionInput;
import io.github.atomledger.atommapper.structure.AtomCorrespondence;
import io.github.atomledger.atommapper.structure.MoleculeGraph;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

/**
 * Reads the atom-atom map of an {@link RxnFile} onto a reaction of ours: each molecule of the
 * file is matched to a participant copy on the same side (heavy-atom graphs, elements kept; bond
 * orders when they agree, the skeleton alone otherwise, so that a drawing with another
 * protonation or Kekulé form still matches), and each mapping number present on both sides
 * becomes a transition between the matched atoms. Molecules the reaction lacks are problems;
 * participants the file leaves out are simply not mapped (the caller's validation names any
 * carbon left over). Stateless and thread-safe.
 */
public final class RxnMaps {

    /**
     * The map as read.
     *
     * @param carbons  transitions whose reactant or product atom is a carbon, sorted (the element
     *                 is the reactant atom's)
     * @param problems why the file does not fit the reaction, each naming a line; empty when it fits
     */
    public record Reading(List<AtomTransition> carbons, List<String> problems) {
        public Reading {
            carbons = carbons.stream().sorted().toList();
            problems = List.copyOf(problems);
        }
    }

    private RxnMaps() {
    }

    /** Reads {@code rxn}'s numbers onto {@code input}'s atoms. */
    public static Reading onto(RxnFile rxn, ReactionInput input) {
        List<String> problems = new ArrayList<>();
        Map<Integer, AtomRef> left = side(rxn.reactants(), input.reactants(), "reactant", "substrate", problems);
        Map<Integer, AtomRef> right = side(rxn.products(), input.products(), "product", "product", problems);
        Map<String, MoleculeGraph> graphs = new HashMap<>();
        input.reactants().forEach(p -> graphs.put("L" + p.species(), p.structure().graph()));
        input.products().forEach(p -> graphs.put("R" + p.species(), p.structure().graph()));
        List<AtomTransition> carbons = new ArrayList<>();
        for (Map.Entry<Integer, AtomRef> e : left.entrySet()) {
            AtomRef to = right.get(e.getKey());
            if (to == null) {
                continue;
            }
            AtomRef from = e.getValue();
            String a = graphs.get("L" + from.species()).element(from.atom() - 1);
            String b = graphs.get("R" + to.species()).element(to.atom() - 1);
            if (a.equals("C") || b.equals("C")) {
                carbons.add(new AtomTransition(from, to, a));
            }
        }
        return new Reading(carbons, problems);
    }

    /**
     * Writes a reaction and a map of it as a V2000 RXN file: one molecule per participant copy,
     * in input order, atoms in each structure's own order; the k-th transition of {@code map}
     * (sorted) puts mapping number k on both of its atoms. Deterministic.
     *
     * @param map transitions between atoms of {@code input} (all heavy atoms or carbons only)
     * @throws io.github.atomledger.atommapper.structure.StructureException when a molecule cannot
     *     be written, or a transition names an atom the reaction does not have
     */
    public static String write(String name, String comment, ReactionInput input, List<AtomTransition> map)
            throws io.github.atomledger.atommapper.structure.StructureException {
        Map<AtomRef, Integer> numbers = new HashMap<>();
        int n = 0;
        for (AtomTransition t : map.stream().sorted().toList()) {
            n++;
            numbers.put(new AtomRef("L" + t.from().species(), t.from().copy(), t.from().atom()), n);
            numbers.put(new AtomRef("R" + t.to().species(), t.to().copy(), t.to().atom()), n);
        }
        List<RxnFile.Part> reactants = parts(input.reactants(), "L", numbers);
        List<RxnFile.Part> products = parts(input.products(), "R", numbers);
        long placed = reactants.stream().mapToLong(p -> java.util.Arrays.stream(p.mapNumbers()).filter(x -> x > 0).count()).sum()
                + products.stream().mapToLong(p -> java.util.Arrays.stream(p.mapNumbers()).filter(x -> x > 0).count()).sum();
        if (placed != numbers.size()) {
            throw new io.github.atomledger.atommapper.structure.StructureException("the map of " + name
                    + " names atoms the reaction does not have");
        }
        return RxnFile.write(name, comment, reactants, products);
    }

    private static List<RxnFile.Part> parts(List<Participant> side, String tag, Map<AtomRef, Integer> numbers) {
        List<RxnFile.Part> out = new ArrayList<>();
        Map<String, Integer> counts = new HashMap<>();
        for (Participant p : side) {
            for (int c = 0; c < p.coefficient(); c++) {
                int copy = counts.merge(p.species(), 1, Integer::sum);
                int[] mapNumbers = new int[p.structure().heavyAtomCount()];
                for (int k = 0; k < mapNumbers.length; k++) {
                    mapNumbers[k] = numbers.getOrDefault(new AtomRef(tag + p.species(), copy, k + 1), 0);
                }
                out.add(new RxnFile.Part(p.species(), p.structure(), mapNumbers));
            }
        }
        return out;
    }

    /** Mapping number to our atom, for one side. */
    private static Map<Integer, AtomRef> side(List<RxnFile.Molecule> molecules, List<Participant> participants,
                                              String fileWord, String ourWord, List<String> problems) {
        List<AtomRef> copies = new ArrayList<>();
        List<Participant> owners = new ArrayList<>();
        Map<String, Integer> counts = new HashMap<>();
        for (Participant p : participants) {
            for (int c = 0; c < p.coefficient(); c++) {
                copies.add(new AtomRef(p.species(), counts.merge(p.species(), 1, Integer::sum), 1));
                owners.add(p);
            }
        }
        boolean[] used = new boolean[copies.size()];
        Map<Integer, AtomRef> byNumber = new TreeMap<>();
        for (int m = 0; m < molecules.size(); m++) {
            RxnFile.Molecule molecule = molecules.get(m);
            MoleculeGraph drawn = molecule.structure().graph();
            int chosen = -1;
            int[] at = null;
            for (boolean strict : new boolean[] {true, false}) {
                for (int k = 0; k < copies.size() && chosen < 0; k++) {
                    if (used[k]) {
                        continue;
                    }
                    Optional<int[]> found = AtomCorrespondence.find(drawn, owners.get(k).structure().graph(), strict);
                    if (found.isPresent()) {
                        chosen = k;
                        at = found.get();
                    }
                }
                if (chosen >= 0) {
                    break;
                }
            }
            if (chosen < 0) {
                problems.add(fileWord + " " + (m + 1) + " (line " + molecule.line() + ", "
                        + molecule.structure().formula().toHillString() + ") matches no " + ourWord
                        + " of the reaction");
                continue;
            }
            used[chosen] = true;
            AtomRef copy = copies.get(chosen);
            int[] numbers = molecule.structure().mapNumbers();
            for (int i = 0; i < numbers.length; i++) {
                if (numbers[i] <= 0) {
                    continue;
                }
                AtomRef ours = new AtomRef(copy.species(), copy.copy(), at[i] + 1);
                AtomRef before = byNumber.putIfAbsent(numbers[i], ours);
                if (before != null) {
                    problems.add("mapping number " + numbers[i] + " is used twice among the " + fileWord + "s (line "
                            + molecule.line() + ")");
                }
            }
        }
        return byNumber;
    }
}
