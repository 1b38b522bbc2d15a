package io.github.atomledger.atommapper.mapping;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.formula.FormulaParser;
import io.github.atomledger.atommapper.structure.Structure;
import java.util.ArrayList;
import java.util.List;

/**
 * Test fixtures: molecules checked against the formula the test expects, reactions written as
 * {@code "2 a + b -> c"}, and expected carbon maps written as {@code "a 1>c 3; b#2 4>c 1"}.
 */
final class Reactions {

    private final java.util.Map<String, Structure> molecules = new java.util.HashMap<>();

    /** Registers a molecule; fails the test unless CDK's formula of the SMILES is {@code formula}. */
    Reactions mol(String species, String smiles, String formula) {
        Structure s = parse(smiles);
        try {
            assertThat(s.formula()).as("formula of %s %s", species, smiles).isEqualTo(FormulaParser.parse(formula));
        } catch (io.github.atomledger.atommapper.formula.FormulaSyntaxException e) {
            throw new AssertionError(e);
        }
        molecules.put(species, s);
        return this;
    }

    static Structure parse(String smiles) {
        try {
            return Structure.fromSmiles(smiles);
        } catch (io.github.atomledger.atommapper.structure.StructureException e) {
            throw new AssertionError(e);
        }
    }

    /** A reaction from text such as {@code "accoa + oaa + h2o -> cit + coa"}. */
    ReactionInput reaction(String id, String text) {
        String[] sides = text.split("->");
        return new ReactionInput(id, side(sides[0]), side(sides[1]));
    }

    private List<Participant> side(String text) {
        List<Participant> out = new ArrayList<>();
        for (String part : text.split("\\+")) {
            String[] w = part.trim().split("\\s+");
            int coefficient = w.length == 2 ? Integer.parseInt(w[0]) : 1;
            String species = w[w.length - 1];
            Structure s = molecules.get(species);
            if (s == null) {
                throw new IllegalArgumentException("unknown fixture " + species);
            }
            out.add(new Participant(species, s, coefficient));
        }
        return out;
    }

    /** Transitions from {@code "a 1>c 3; b#2 4>c 1"} (element C, copies default to 1). */
    static List<AtomTransition> carbons(String text) {
        List<AtomTransition> out = new ArrayList<>();
        for (String t : text.split(";")) {
            String[] ends = t.trim().split(">");
            out.add(new AtomTransition(ref(ends[0]), ref(ends[1]), "C"));
        }
        return out;
    }

    private static AtomRef ref(String text) {
        String[] w = text.trim().split("\\s+");
        String[] sc = w[0].split("#");
        return new AtomRef(sc[0], sc.length > 1 ? Integer.parseInt(sc[1]) : 1, Integer.parseInt(w[1]));
    }

    /** Asserts that the result's carbon map equals {@code expected} up to the molecules' symmetry. */
    static void assertCarbons(ReactionInput reaction, MappingResult result, String expected) {
        assertThat(AtomMapper.sameUpToSymmetry(reaction, result.carbonTransitions(), carbons(expected)))
                .as("carbon map of %s: got %s, expected %s", reaction.reactionId(),
                        result.carbonTransitions(), expected)
                .isTrue();
    }
}
