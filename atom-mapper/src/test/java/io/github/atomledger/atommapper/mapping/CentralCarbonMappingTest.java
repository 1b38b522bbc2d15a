package io.github.atomledger.atommapper.mapping;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Issue 3: central carbon metabolism. Expected carbon fates are the atom transitions used in 13C
 * flux networks (for example Antoniewicz, Kelleher &amp; Stephanopoulos 2007, Metab Eng 9:68);
 * the atom-by-atom tables below are written from memory of that biochemistry. Cofactors that
 * only carry hydrogen (NAD(P)H, FADH2) are left out where noted: hydrogens are implicit, so the
 * heavy atoms still balance.
 */
class CentralCarbonMappingTest {

    private static final Reactions FIXTURES = Metabolites.all();
    private static final AtomMapper MAPPER = new AtomMapper(MappingOptions.defaults());

    static MappingResult mapped(String id, String text, String expected, String status) {
        ReactionInput reaction = FIXTURES.reaction(id, text);
        MappingResult result = MAPPER.map(reaction);
        assertThat(result.status().label()).as("%s", result).isEqualTo(status);
        assertThat(result.cost()).isEqualTo(result.lowerBound());
        assertCarbonsOf(reaction, result, expected);
        return result;
    }

    /** The result's transitions of the expected reactant carbons equal the expected ones up to symmetry. */
    static void assertCarbonsOf(ReactionInput reaction, MappingResult result, String expected) {
        List<AtomTransition> want = Reactions.carbons(expected);
        List<AtomRef> from = want.stream().map(AtomTransition::from).toList();
        List<AtomTransition> got = result.carbonTransitions().stream().filter(t -> from.contains(t.from())).toList();
        assertThat(AtomMapper.sameUpToSymmetry(reaction, got, want))
                .as("%s: got %s, expected %s", reaction.reactionId(), got, expected).isTrue();
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        hexokinase            | glc + atp -> g6p + adp | glc 5>g6p 2; glc 7>g6p 15; glc 9>g6p 13; glc 11>g6p 11; glc 3>g6p 4; glc 2>g6p 5
        phosphoglucose isomerase | g6p -> f6p        | g6p 2>f6p 2; g6p 15>f6p 3; g6p 13>f6p 15; g6p 11>f6p 13; g6p 4>f6p 6; g6p 5>f6p 7
        phosphofructokinase   | f6p + atp -> fbp + adp | f6p 2>fbp 6; f6p 3>fbp 7; f6p 15>fbp 19; f6p 13>fbp 17; f6p 6>fbp 10; f6p 7>fbp 11
        aldolase              | fbp -> dhap + g3p      | fbp 6>dhap 5; fbp 7>dhap 3; fbp 19>dhap 2; fbp 17>g3p 2; fbp 10>g3p 3; fbp 11>g3p 5
        triose phosphate isomerase | dhap -> g3p       | dhap 5>g3p 5; dhap 3>g3p 3; dhap 2>g3p 2
        GAPDH with NAD        | g3p + pi + nad -> bpg + nadh | g3p 2>bpg 2; g3p 3>bpg 8; g3p 5>bpg 10
        phosphoglycerate kinase | bpg + adp -> pg3 + atp | bpg 2>pg3 2; bpg 8>pg3 4; bpg 10>pg3 6
        phosphoglycerate mutase | pg3 -> pg2           | pg3 2>pg2 2; pg3 4>pg2 4; pg3 6>pg2 10
        enolase               | pg2 -> pep + h2o       | pg2 2>pep 2; pg2 4>pep 4; pg2 10>pep 5
        pyruvate kinase       | pep + adp -> pyr + atp | pep 2>pyr 4; pep 4>pyr 2; pep 5>pyr 1
        """)
    void mapsGlycolysisCarbonsAsIn13cNetworks(String id, String text, String expected) {
        mapped(id, text, expected, "mapped");
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        transketolase 1 | xu5p + r5p -> g3p + s7p  | xu5p 2>s7p 2; xu5p 3>s7p 3; xu5p 5>g3p 2; xu5p 7>g3p 3; xu5p 9>g3p 5; r5p 2>s7p 5; r5p 13>s7p 7; r5p 11>s7p 9; r5p 4>s7p 11; r5p 5>s7p 13
        transaldolase   | s7p + g3p -> e4p + f6p   | s7p 2>f6p 2; s7p 3>f6p 3; s7p 5>f6p 15; s7p 7>e4p 2; s7p 9>e4p 3; s7p 11>e4p 5; s7p 13>e4p 7; g3p 2>f6p 13; g3p 3>f6p 6; g3p 5>f6p 7
        transketolase 2 | xu5p + e4p -> g3p + f6p  | xu5p 2>f6p 2; xu5p 3>f6p 3; xu5p 5>g3p 2; xu5p 7>g3p 3; xu5p 9>g3p 5; e4p 2>f6p 15; e4p 3>f6p 13; e4p 5>f6p 6; e4p 7>f6p 7
        """)
    void movesTwoAndThreeCarbonUnitsInPentosePhosphatePathway(String id, String text, String expected) {
        mapped(id, text, expected, "mapped");
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        pyruvate dehydrogenase  | pyr + coa -> accoa + co2            | pyr 1>accoa 1; pyr 2>accoa 2; pyr 4>co2 2
        isocitrate dehydrogenase | icit -> akg + co2                  | icit 11>co2 2; icit 8>akg 8; icit 6>akg 6; icit 5>akg 5; icit 4>akg 4; icit 2>akg 2
        2-oxoglutarate dehydrogenase | akg + coa -> succoa + co2      | akg 8>co2 2; akg 6>succoa 6; akg 5>succoa 5; akg 4>succoa 4; akg 2>succoa 2
        succinyl-CoA synthetase | succoa + adp + pi -> succ + atp + coa | succoa 6>succ 6; succoa 5>succ 5; succoa 4>succ 4; succoa 2>succ 2
        succinate dehydrogenase | succ -> fum                         | succ 2>fum 2; succ 4>fum 4; succ 5>fum 5; succ 6>fum 6
        fumarase                | fum + h2o -> mal                    | fum 2>mal 2; fum 4>mal 4; fum 5>mal 5; fum 6>mal 7
        malate dehydrogenase    | mal -> oaa                          | mal 2>oaa 2; mal 4>oaa 4; mal 5>oaa 5; mal 7>oaa 7
        pyruvate carboxylase    | pyr + hco3 + atp -> oaa + adp + pi  | pyr 1>oaa 4; pyr 2>oaa 5; pyr 4>oaa 7; hco3 2>oaa 2
        PEP carboxylase         | pep + hco3 -> oaa + pi              | pep 2>oaa 7; pep 4>oaa 5; pep 5>oaa 4; hco3 2>oaa 2
        isocitrate lyase        | icit -> succ + glx                  | icit 6>glx 2; icit 8>glx 3; icit 2>succ 2; icit 4>succ 4; icit 5>succ 5; icit 11>succ 6
        malate synthase         | glx + accoa + h2o -> mal + coa      | accoa 1>mal 4; accoa 2>mal 2; glx 2>mal 5; glx 3>mal 7
        """)
    void mapsTcaCycleAndAnapleroticCarbons(String id, String text, String expected) {
        MappingResult result = mapped(id, text, expected, "mapped");
        assertThat(result.needsStereoPin()).as("%s notes %s", id, result.stereoNotes()).isFalse();
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        citrate synthase | accoa + oaa + h2o -> cit + coa | accoa 1>cit 4; accoa 2>cit 2; oaa 4>cit 7; oaa 2>cit 8; oaa 5>cit 5; oaa 7>cit 11
        aconitase        | cit -> icit                    | cit 7>icit 6; cit 8>icit 8; cit 5>icit 5; cit 11>icit 11; cit 4>icit 4; cit 2>icit 2
        """)
    void flagsCitrateArmsAsProchiral(String id, String text, String expected) {
        MappingResult result = mapped(id, text, expected, "mapped");
        assertThat(result.needsStereoPin()).isTrue();
        assertThat(result.stereoNotes()).singleElement().asString().startsWith("cit copy 1:");
        assertThat(result.prochiralAtoms()).extracting(AtomRef::species).containsOnly("cit");
        assertThat(result.prochiralAtoms()).extracting(AtomRef::atom).containsExactly(2, 4, 7, 8);
    }
}
