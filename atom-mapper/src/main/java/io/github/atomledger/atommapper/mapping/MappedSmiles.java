package io.github.atomledger.atommapper.mapping;

import io.github.atomledger.atommapper.structure.Structure;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.openscience.cdk.exception.InvalidSmilesException;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmilesParser;

/**
 * Reads the full heavy-atom map back out of a {@link MappingResult#mappedSmiles()} text, for a
 * reaction whose cached result kept only the carbon transitions. In that text a reactant atom's
 * class is its position on the reactant side (participants in input order, copies, heavy atoms)
 * and a product atom's class is the position of the reactant atom it comes from. Product atoms
 * are identified by writing the product side again with each atom's own position as its class:
 * the writer's atom order does not depend on the class values, and the element of every atom is
 * compared to make sure.
 *
 * <p>Stateless and thread-safe.
 */
public final class MappedSmiles {

    private MappedSmiles() {
    }

    /**
     * @param input        the reaction the text was written for (same participants, same order)
     * @param mappedSmiles the mapper's mapped reaction SMILES
     * @return every mapped heavy-atom transition, sorted; empty when the text does not belong to
     *     {@code input} (different atoms or elements) or cannot be read
     */
    public static Optional<List<AtomTransition>> atomMap(ReactionInput input, String mappedSmiles) {
        int arrow = mappedSmiles.indexOf(">>");
        if (arrow < 0) {
            return Optional.empty();
        }
        List<AtomRef> left = positions(input.reactants());
        List<AtomRef> right = positions(input.products());
        List<String> leftElements = elements(input.reactants());
        List<String> rightElements = elements(input.products());
        StringBuilder identity = new StringBuilder();
        int offset = 0;
        for (Participant p : input.products()) {
            int n = p.structure().heavyAtomCount();
            for (int copy = 1; copy <= p.coefficient(); copy++) {
                int[] classes = new int[n];
                for (int i = 0; i < n; i++) {
                    classes[i] = offset + i + 1;
                }
                offset += n;
                identity.append(identity.length() > 0 ? "." : "").append(p.structure().smilesWithAtomClasses(classes));
            }
        }
        try {
            SmilesParser parser = new SmilesParser(SilentChemObjectBuilder.getInstance());
            IAtomContainer mapped = parser.parseSmiles(mappedSmiles.substring(arrow + 2));
            IAtomContainer own = parser.parseSmiles(identity.toString());
            if (mapped.getAtomCount() != own.getAtomCount()) {
                return Optional.empty();
            }
            List<AtomTransition> out = new ArrayList<>();
            for (int i = 0; i < own.getAtomCount(); i++) {
                IAtom a = own.getAtom(i);
                IAtom b = mapped.getAtom(i);
                if (!a.getSymbol().equals(b.getSymbol())) {
                    return Optional.empty();
                }
                int to = a.getMapIdx();
                int from = b.getMapIdx();
                if (to <= 0 || from <= 0) {
                    continue;
                }
                if (to > right.size() || from > left.size() || !leftElements.get(from - 1).equals(rightElements.get(to - 1))) {
                    return Optional.empty();
                }
                out.add(new AtomTransition(left.get(from - 1), right.get(to - 1), leftElements.get(from - 1)));
            }
            return Optional.of(out.stream().sorted().toList());
        } catch (InvalidSmilesException | RuntimeException e) {
            return Optional.empty();
        }
    }

    private static List<AtomRef> positions(List<Participant> side) {
        // Copies are numbered per species across the side, as the mapper numbers them.
        java.util.Map<String, Integer> copies = new java.util.HashMap<>();
        List<AtomRef> out = new ArrayList<>();
        for (Participant p : side) {
            for (int c = 0; c < p.coefficient(); c++) {
                int copy = copies.merge(p.species(), 1, Integer::sum);
                for (int k = 1; k <= p.structure().heavyAtomCount(); k++) {
                    out.add(new AtomRef(p.species(), copy, k));
                }
            }
        }
        return out;
    }

    private static List<String> elements(List<Participant> side) {
        List<String> out = new ArrayList<>();
        for (Participant p : side) {
            Structure s = p.structure();
            for (int copy = 1; copy <= p.coefficient(); copy++) {
                for (int k = 0; k < s.heavyAtomCount(); k++) {
                    out.add(s.graph().element(k));
                }
            }
        }
        return out;
    }
}
