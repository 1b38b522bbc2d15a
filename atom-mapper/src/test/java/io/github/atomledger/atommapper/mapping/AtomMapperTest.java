package io.github.atomledger.atommapper.mapping;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.atommapper.structure.StructureException;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Issue 3: statuses, pins, determinism and output forms of {@link AtomMapper}. */
class AtomMapperTest {

    private static final Reactions FIXTURES = Metabolites.all();
    private static final AtomMapper MAPPER = new AtomMapper(MappingOptions.defaults());

    @Test
    void givesTheSameResultsOnOneAndTwoThreads() {
        List<ReactionInput> reactions = List.of(
                FIXTURES.reaction("CS", "accoa + oaa + h2o -> cit + coa"),
                FIXTURES.reaction("MCM", "mmcoa -> succoa"),
                FIXTURES.reaction("PDC", "pyr -> acald"),
                FIXTURES.reaction("TKT", "xu5p + r5p -> g3p + s7p"),
                FIXTURES.reaction("THL", "acacoa + coa -> 2 accoa"),
                FIXTURES.reaction("GAPDH", "g3p + pi + nad -> bpg + nadh"));
        List<MappingResult> one = MAPPER.mapAll(reactions, 1);
        List<MappingResult> two = MAPPER.mapAll(reactions, 2);
        assertThat(two).isEqualTo(one);
        assertThat(two).extracting(MappingResult::reactionId).containsExactly("CS", "MCM", "PDC", "TKT", "THL", "GAPDH");
        assertThat(MAPPER.map(reactions.get(0))).isEqualTo(one.get(0));
    }

    @Test
    void reportsBestFoundWithProvenLowerBoundWhenNodeBudgetRunsOut() {
        AtomMapper tight = new AtomMapper(MappingOptions.defaults().withNodeLimit(300));
        MappingResult result = tight.map(FIXTURES.reaction("TALA", "s7p + g3p -> e4p + f6p"));
        assertThat(result.status()).isEqualTo(MappingStatus.BEST_FOUND);
        assertThat(result.lowerBound()).isLessThanOrEqualTo(8).isLessThanOrEqualTo(result.cost());
        assertThat(result.cost()).isGreaterThanOrEqualTo(8);
        assertThat(result.atomMap()).hasSize(28);
        assertThat(result.reason()).contains("budget");
    }

    @Test
    void refusesReactionsAboveTheSizeCap() {
        AtomMapper small = new AtomMapper(MappingOptions.defaults().withMaxHeavyAtoms(40));
        MappingResult result = small.map(FIXTURES.reaction("CS", "accoa + oaa + h2o -> cit + coa"));
        assertThat(result.status()).isEqualTo(MappingStatus.TOO_LARGE);
        assertThat(result.reason()).isEqualTo("each side has 61 heavy atoms, more than the cap of 40");
        assertThat(result.cost()).isEqualTo(-1);
    }

    @Test
    void ignoresProtonsAndChargesOfIonisedDrawings() throws StructureException {
        // Pyruvate kinase with pH 7 ions on one side and neutral acids on the other: only H differs.
        ReactionInput reaction = new ReactionInput("PYK", List.of(
                new Participant("pep", Structure.fromSmiles("[O-]C(=O)C(=C)OP(=O)([O-])[O-]"), 1),
                new Participant("adp", FIXTURES.reaction("x", "adp -> adp").reactants().get(0).structure(), 1),
                new Participant("h", Structure.fromSmiles("[H+]"), 1)),
                List.of(new Participant("pyr", Structure.fromSmiles("CC(=O)C(=O)O"), 1),
                        new Participant("atp", FIXTURES.reaction("x", "atp -> atp").reactants().get(0).structure(), 1)));
        MappingResult result = MAPPER.map(reaction);
        assertThat(result.status()).isEqualTo(MappingStatus.MAPPED);
        CentralCarbonMappingTest.assertCarbonsOf(reaction, result, "pep 2>pyr 4; pep 4>pyr 2; pep 5>pyr 1");
    }

    @Test
    void measuresHowMuchDearerACuratedPinIs() {
        ReactionInput reaction = FIXTURES.reaction("TPI", "dhap -> g3p");
        MappingResult free = MAPPER.map(reaction);
        // Pin DHAP C1 (the phosphorylated carbon) to the aldehyde carbon: the phosphate must move.
        MappingResult pinned = MAPPER.map(reaction, Reactions.carbons("dhap 5>g3p 2"));
        assertThat(pinned.provenOptimal()).isTrue();
        assertThat(pinned.carbonTransitions()).contains(Reactions.carbons("dhap 5>g3p 2").get(0));
        assertThat(pinned.cost()).isGreaterThan(free.cost());
        MappingResult same = MAPPER.map(reaction, Reactions.carbons("dhap 5>g3p 5"));
        assertThat(same.cost()).isEqualTo(free.cost());
    }

    @Test
    void rejectsInfeasiblePins() {
        ReactionInput reaction = FIXTURES.reaction("TPI", "dhap -> g3p");
        assertThat(MAPPER.map(reaction, List.of(new AtomTransition(new AtomRef("dhap", 1, 1), new AtomRef("g3p", 1, 2), "C"))).reason())
                .isEqualTo("pin dhap#1:1 -> g3p#1:2 joins O to C");
        assertThat(MAPPER.map(reaction, Reactions.carbons("dhap 2>g3p 99")).reason())
                .isEqualTo("pinned atom g3p#1:99 is not a product atom");
        assertThat(MAPPER.map(reaction, Reactions.carbons("dhap 2>g3p 2; dhap 3>g3p 2")).status())
                .isEqualTo(MappingStatus.UNMAPPABLE);
    }

    @Test
    void writesReactionSmilesWhoseAtomClassesRepeatTheMap() throws Exception {
        MappingResult result = MAPPER.map(FIXTURES.reaction("PDH", "pyr + coa -> accoa + co2"));
        String smiles = result.mappedSmiles();
        assertThat(smiles).contains(">>").startsWith("[CH3:1][C:2](=[O:3])[C:4](=[O:5])[OH:6]");
        List<Integer> left = classes(smiles.substring(0, smiles.indexOf(">>")));
        List<Integer> right = classes(smiles.substring(smiles.indexOf(">>") + 2));
        assertThat(right).containsExactlyInAnyOrderElementsOf(left);
        assertThat(smiles.substring(smiles.indexOf(">>") + 2)).contains("[CH3:1][C:2](=[O:3])[S:");
    }

    private static List<Integer> classes(String smiles) {
        List<Integer> out = new ArrayList<>();
        java.util.regex.Matcher m = java.util.regex.Pattern.compile(":(\\d+)]").matcher(smiles);
        while (m.find()) {
            out.add(Integer.parseInt(m.group(1)));
        }
        return out;
    }

    @Test
    void listsBondEditsThatAddUpToTheCost() {
        MappingResult result = MAPPER.map(FIXTURES.reaction("CS", "accoa + oaa + h2o -> cit + coa"));
        assertThat(result.bondEdits()).extracting(BondEdit::kind).containsExactly(BondEdit.Kind.BROKEN,
                BondEdit.Kind.FORMED, BondEdit.Kind.FORMED, BondEdit.Kind.ORDER_CHANGED);
        assertThat(result.bondEdits().stream().mapToInt(BondEdit::weight).sum()).isEqualTo(result.cost()).isEqualTo(5);
        assertThat(result.atomMap()).isSortedAccordingTo(java.util.Comparator.comparing(AtomTransition::from));
        assertThat(result.atomMap()).allSatisfy(t -> assertThat(t.element()).isNotBlank());
    }

    @Test
    void tellsSymmetricCarbonMapsApartOnlyWhenClassesDiffer() {
        ReactionInput sdh = FIXTURES.reaction("SDH", "succ -> fum");
        assertThat(AtomMapper.sameUpToSymmetry(sdh, Reactions.carbons("succ 2>fum 2; succ 4>fum 4; succ 5>fum 5; succ 6>fum 6"),
                Reactions.carbons("succ 2>fum 6; succ 4>fum 5; succ 5>fum 4; succ 6>fum 2"))).isTrue();
        ReactionInput mcm = FIXTURES.reaction("MCM", "mmcoa -> succoa");
        assertThat(AtomMapper.sameUpToSymmetry(mcm, Reactions.carbons("mmcoa 4>succoa 4; mmcoa 5>succoa 5"),
                Reactions.carbons("mmcoa 4>succoa 5; mmcoa 5>succoa 4"))).isFalse();
        assertThatThrownBy(() -> AtomMapper.sameUpToSymmetry(sdh, Reactions.carbons("succ 9>fum 2"), List.of()))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("succ#1:9");
    }

    @Test
    void offersAnUnmappableResultForFractionalCoefficients() {
        MappingResult result = MappingResult.unmappable("R1", "coefficient of s_1 (0.5) is not an integer");
        assertThat(result.status().label()).isEqualTo("unmappable");
        assertThat(result.provenOptimal()).isFalse();
        assertThat(result.mappedSmiles()).isEmpty();
    }
}
