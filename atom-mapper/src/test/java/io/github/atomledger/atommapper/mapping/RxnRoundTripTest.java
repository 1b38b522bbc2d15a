package io.github.atomledger.atommapper.mapping;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.ctfile.RxnFile;
import io.github.atomledger.atommapper.ctfile.RxnMaps;
import java.io.StringReader;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IReaction;
import org.openscience.cdk.io.MDLRXNV2000Reader;
import org.openscience.cdk.io.MDLRXNWriter;
import org.openscience.cdk.silent.SilentChemObjectBuilder;

/**
 * Issue 15: maps out as MDL RXN files and back. The reference is CDK's own RXN reader and writer
 * (general-purpose reference library): every exported map must read back through CDK with the
 * same atom-atom pairs, and a file CDK writes must read back through ours with the same pairs.
 * Reactions and structures are the central-carbon fixtures (from memory, see {@link Metabolites}).
 */
class RxnRoundTripTest {

    private static final Reactions FIXTURES = Metabolites.all();
    private static final AtomMapper MAPPER = new AtomMapper(MappingOptions.defaults());

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        hexokinase       | glc + atp -> g6p + adp
        aldolase         | fbp -> dhap + g3p
        transketolase 1  | xu5p + r5p -> g3p + s7p
        citrate synthase | accoa + oaa + h2o -> cit + coa
        two copies       | 2 pyr -> 2 pyr
        """)
    void exportedMapsReadBackThroughCdkAndCdksFilesReadBackThroughOurs(String id, String text) throws Exception {
        ReactionInput input = FIXTURES.reaction(id.replace(' ', '_'), text);
        MappingResult result = MAPPER.map(input);
        assertThat(result.atomMap()).isNotEmpty();

        List<AtomTransition> decoded = MappedSmiles.atomMap(input, result.mappedSmiles()).orElseThrow();
        assertThat(decoded).as("full map from the mapped SMILES").isEqualTo(result.atomMap().stream().sorted().toList());

        String rxn = RxnMaps.write(input.reactionId(), "origin=inferred", input, decoded);
        IReaction cdk;
        try (MDLRXNV2000Reader reader = new MDLRXNV2000Reader(new StringReader(rxn))) {
            cdk = reader.read(SilentChemObjectBuilder.getInstance().newReaction());
        }
        assertThat(pairs(cdk, input)).as("pairs CDK reads from our file").isEqualTo(pairs(decoded));

        StringWriter again = new StringWriter();
        try (MDLRXNWriter writer = new MDLRXNWriter(again)) {
            writer.write(cdk);
        }
        RxnMaps.Reading back = RxnMaps.onto(RxnFile.parse(again.toString()), input);
        assertThat(back.problems()).isEmpty();
        assertThat(back.carbons()).as("carbons we read from CDK's file").isEqualTo(result.carbonTransitions());
    }

    /** Pairs as "species#copy:atom>species#copy:atom" from our transitions. */
    private static TreeSet<String> pairs(List<AtomTransition> map) {
        TreeSet<String> out = new TreeSet<>();
        map.forEach(t -> out.add(t.from() + ">" + t.to()));
        return out;
    }

    /**
     * Pairs CDK reads: molecules are the participant copies in order, heavy atoms in file order,
     * equal map numbers on the two sides make a pair.
     */
    private static TreeSet<String> pairs(IReaction rxn, ReactionInput input) {
        Map<Integer, String> left = numbers(rxn.getReactants().atomContainers(), input.reactants());
        Map<Integer, String> right = numbers(rxn.getProducts().atomContainers(), input.products());
        TreeSet<String> out = new TreeSet<>();
        left.forEach((n, a) -> {
            if (right.containsKey(n)) {
                out.add(a + ">" + right.get(n));
            }
        });
        return out;
    }

    private static Map<Integer, String> numbers(Iterable<IAtomContainer> molecules, List<Participant> side) {
        List<String> copies = new ArrayList<>();
        Map<String, Integer> count = new HashMap<>();
        for (Participant p : side) {
            for (int c = 0; c < p.coefficient(); c++) {
                copies.add(p.species() + "#" + count.merge(p.species(), 1, Integer::sum));
            }
        }
        Map<Integer, String> out = new HashMap<>();
        int m = 0;
        for (IAtomContainer mol : molecules) {
            int heavy = 0;
            for (IAtom a : mol.atoms()) {
                if (a.getAtomicNumber() != null && a.getAtomicNumber() == 1) {
                    continue;
                }
                heavy++;
                if (a.getMapIdx() > 0) {
                    out.put(a.getMapIdx(), copies.get(m) + ":" + heavy);
                }
            }
            m++;
        }
        return out;
    }
}
