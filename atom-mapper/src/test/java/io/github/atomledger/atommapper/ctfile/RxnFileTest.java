package io.github.atomledger.atommapper.ctfile;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.atommapper.mapping.Participant;
import io.github.atomledger.atommapper.mapping.ReactionInput;
import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.atommapper.structure.StructureException;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Issue 15: reading RXN files (CTfile standard, layouts from memory: BIOVIA "CTfile Formats").
 * The chemistry is carbonic acid formation, CO2 + H2O -> H2CO3 (common knowledge).
 */
class RxnFileTest {

    static final String V3000 = """
            $RXN V3000
            carbonic acid
              hand
            written by hand, atoms numbered for the map
            M  V30 COUNTS 2 1
            M  V30 BEGIN REACTANT
            M  V30 BEGIN CTAB
            M  V30 COUNTS 3 2 0 0 0
            M  V30 BEGIN ATOM
            M  V30 1 O 0 0 0 1
            M  V30 2 C 1.2 0 0 2
            M  V30 3 O 2.4 0 0 3
            M  V30 END ATOM
            M  V30 BEGIN BOND
            M  V30 1 2 1 2
            M  V30 2 2 2 3
            M  V30 END BOND
            M  V30 END CTAB
            M  V30 BEGIN CTAB
            M  V30 COUNTS 1 0 0 0 0
            M  V30 BEGIN ATOM
            M  V30 1 O 0 0 0 4
            M  V30 END ATOM
            M  V30 END CTAB
            M  V30 END REACTANT
            M  V30 BEGIN PRODUCT
            M  V30 BEGIN CTAB
            M  V30 COUNTS 4 3 0 0 0
            M  V30 BEGIN ATOM
            M  V30 1 O 1.2 0 0 1
            M  V30 2 C 0 0 0 2
            M  V30 3 O -0.6 1 0 3
            M  V30 4 O -0.6 -1 0 4
            M  V30 END ATOM
            M  V30 BEGIN BOND
            M  V30 1 2 2 1
            M  V30 2 1 2 3
            M  V30 3 1 2 4
            M  V30 END BOND
            M  V30 END CTAB
            M  V30 END PRODUCT
            M  END
            """.stripIndent();

    private static ReactionInput carbonicAcid() throws StructureException {
        // Our own atom order differs from the file's: in "OC(O)=O" the carbon is atom 2 as well,
        // but in "O=C=O" the oxygens come first; water is one atom.
        return new ReactionInput("CA", List.of(new Participant("co2", Structure.fromSmiles("O=C=O"), 1),
                new Participant("h2o", Structure.fromSmiles("O"), 1)),
                List.of(new Participant("h2co3", Structure.fromSmiles("OC(O)=O"), 1)));
    }

    @Test
    void readsAV3000FileWithItsMapNumbersOntoOurAtoms() throws StructureException {
        RxnFile rxn = RxnFile.parse(V3000);
        assertThat(rxn.name()).isEqualTo("carbonic acid");
        assertThat(rxn.reactants()).extracting(m -> m.structure().formula().toHillString()).containsExactly("CO2", "H2O");
        assertThat(rxn.products()).extracting(m -> m.structure().formula().toHillString()).containsExactly("CH2O3");
        assertThat(rxn.products().get(0).structure().mapNumbers()).containsExactly(1, 2, 3, 4);
        RxnMaps.Reading reading = RxnMaps.onto(rxn, carbonicAcid());
        assertThat(reading.problems()).isEmpty();
        assertThat(reading.carbons()).containsExactly(
                new AtomTransition(new AtomRef("co2", 1, 2), new AtomRef("h2co3", 1, 2), "C"));
    }

    @Test
    void aMoleculeTheReactionLacksIsAProblemNamingItsLine() throws StructureException {
        // The water of the file drawn as methanol: no substrate of ours is CH4O.
        String methanol = V3000.replace("M  V30 COUNTS 1 0 0 0 0\nM  V30 BEGIN ATOM\nM  V30 1 O 0 0 0 4\nM  V30 END ATOM\n",
                "M  V30 COUNTS 2 1 0 0 0\nM  V30 BEGIN ATOM\nM  V30 1 O 0 0 0 4\nM  V30 2 C 1 0 0 0\nM  V30 END ATOM\n"
                        + "M  V30 BEGIN BOND\nM  V30 1 1 1 2\nM  V30 END BOND\n");
        RxnMaps.Reading reading = RxnMaps.onto(RxnFile.parse(methanol), carbonicAcid());
        assertThat(reading.problems()).containsExactly("reactant 2 (line 19, CH4O) matches no substrate of the reaction");
    }

    @Test
    void brokenFilesAreRefusedWithTheLine() {
        assertThatThrownBy(() -> RxnFile.parse("RXN\n")).isInstanceOf(StructureException.class)
                .satisfies(e -> assertThat(((StructureException) e).line()).isEqualTo(1));
        String badBond = V3000.replace("M  V30 3 1 2 4", "M  V30 3 1 2 9");
        assertThatThrownBy(() -> RxnFile.parse(badBond)).hasMessageContaining("bond 3 joins atoms 2 and 9")
                .satisfies(e -> assertThat(((StructureException) e).line()).isEqualTo(38));
        String counts = V3000.replace("M  V30 COUNTS 2 1", "M  V30 COUNTS 2 2");
        assertThatThrownBy(() -> RxnFile.parse(counts)).hasMessageContaining("announces 2 reactant(s) and 2 product(s)");
        String v2000 = "$RXN\n\n  hand\n\n  2  1\n$MOL\n";
        assertThatThrownBy(() -> RxnFile.parse(v2000)).hasMessageContaining("molecule 1 has no 'M  END' line");
        assertThatThrownBy(() -> RxnFile.parse("$RXN\n\n\n\n  x  1\n"))
                .hasMessageContaining("reactant count is 'x'")
                .satisfies(e -> assertThat(((StructureException) e).line()).isEqualTo(5));
    }

    @Test
    void writingTheSameMapTwiceGivesTheSameBytes() throws StructureException {
        ReactionInput input = carbonicAcid();
        List<AtomTransition> map = List.of(new AtomTransition(new AtomRef("co2", 1, 2), new AtomRef("h2co3", 1, 2), "C"));
        String a = RxnMaps.write("CA", "origin=curated", input, map);
        assertThat(RxnMaps.write("CA", "origin=curated", input, map)).isEqualTo(a);
        assertThat(a).startsWith("$RXN\nCA\n" + RxnFile.PROGRAM_LINE + "\norigin=curated\n  2  1\n$MOL\n");
        assertThat(RxnMaps.onto(RxnFile.parse(a), input).carbons()).isEqualTo(map);
    }
}
