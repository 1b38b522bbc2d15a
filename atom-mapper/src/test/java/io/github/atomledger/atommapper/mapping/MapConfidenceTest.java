package io.github.atomledger.atommapper.mapping;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.structure.MoleculeGraph;
import io.github.atomledger.atommapper.structure.Structure;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/** Issue 16: margin, runner-up, rearrangement patterns and alternative weightings of {@link AtomMapper}. */
class MapConfidenceTest {

    private static final Reactions FIXTURES = ReferenceMetabolites.all();
    private static final AtomMapper MAPPER = new AtomMapper(MappingOptions.defaults()
            .withTimeBudget(Duration.ofSeconds(60)).withConfidenceBudget(Duration.ofSeconds(60)));

    @ParameterizedTest
    @ValueSource(strings = {"dhap -> g3p", "mal -> oaa", "succ -> fum", "pyr -> acald + co2", "alac -> dhmb"})
    void provesTheSameMarginAsTryingEveryMap(String text) {
        ReactionInput reaction = FIXTURES.reaction("R", text);
        MappingResult result = MAPPER.map(reaction);
        List<int[]> maps = BruteForce.all(reaction);
        int optimum = Integer.MAX_VALUE;
        for (int[] m : maps) {
            optimum = Math.min(optimum, BruteForce.cost(reaction, m));
        }
        List<List<AtomTransition>> optimalFates = new ArrayList<>();
        for (int[] m : maps) {
            if (BruteForce.cost(reaction, m) == optimum) {
                optimalFates.add(BruteForce.carbons(reaction, m));
            }
        }
        int runnerUp = Integer.MAX_VALUE;
        for (int[] m : maps) {
            int c = BruteForce.cost(reaction, m);
            List<AtomTransition> fate = BruteForce.carbons(reaction, m);
            if (c < runnerUp && optimalFates.stream().noneMatch(f -> AtomMapper.sameUpToSymmetry(reaction, f, fate))) {
                runnerUp = c;
            }
        }
        MapConfidence c = result.confidence();
        assertThat(result.cost()).isEqualTo(optimum);
        assertThat(c.computed()).isTrue();
        assertThat(c.marginProven()).isTrue();
        assertThat(c.margin()).as("%s runner-up %s", text, c.runnerUp()).isEqualTo(runnerUp - optimum);
        assertThat(c.runnerUpCost()).isEqualTo(runnerUp);
        assertThat(optimalFates).noneMatch(f -> AtomMapper.sameUpToSymmetry(reaction, f, c.runnerUp()));
    }

    @Test
    void namesTheOneTwoShiftOfMethylmalonylCoaMutaseInWords() {
        MappingResult result = MAPPER.map(FIXTURES.reaction("MCM", "mmcoa -> succoa"));
        Rearrangement shift = result.confidence().rearrangements().get(0);
        assertThat(shift.kind()).isEqualTo(Rearrangement.Kind.CARBON_SHIFT);
        assertThat(shift.description()).matches("1,2-shift: the carbon group at mmcoa atom \\d+ leaves atom \\d+ for its"
                + " neighbour atom \\d+");
        assertThat(result.confidence().reviewReasons(0)).containsExactly(MapConfidence.Reason.REARRANGEMENT);
    }

    @Test
    void seesTheHydroxylWalkingAroundTheRingInsteadOfTheSideChainShift() {
        // 4-hydroxyphenylpyruvate dioxygenase: the optimum moves the ring O; the enzyme moves the side chain.
        MappingResult result = MAPPER.map(FIXTURES.reaction("HPPD", "hpp + o2 -> hgen + co2"));
        assertThat(result.confidence().rearrangements()).extracting(Rearrangement::kind)
                .containsExactly(Rearrangement.Kind.RING_WALK);
        assertThat(result.confidence().runnerUpRearrangements()).extracting(Rearrangement::kind)
                .contains(Rearrangement.Kind.CARBON_SHIFT);
        assertThat(result.confidence().atStake()).isNotEmpty().allMatch(a -> a.species().equals("hpp"));
    }

    @Test
    void findsTheSigmatropicSkeletonChangeOfChorismateMutase() {
        MappingResult result = MAPPER.map(FIXTURES.reaction("CM", "chor -> pphn"));
        assertThat(result.confidence().rearrangements()).extracting(Rearrangement::kind)
                .containsExactly(Rearrangement.Kind.SKELETON_REARRANGEMENT);
        assertThat(result.confidence().rearrangements().get(0).atoms()).hasSize(4);
    }

    @Test
    void reportsATieUnderCarbonCarbonWeightTwoForTheReductoisomerase() {
        // The alkyl migration costs 2 more at weight 3; at weight 2 it ties with moving the carboxyl oxygens.
        MappingResult result = MAPPER.map(FIXTURES.reaction("KARI", "alac -> dhmb"));
        assertThat(result.confidence().weights()).extracting(WeightCheck::carbonCarbonWeight).containsExactly(2, 4);
        WeightCheck two = result.confidence().weights().get(0);
        assertThat(two.outcome()).isEqualTo(WeightCheck.Outcome.TIED);
        assertThat(two.carbons()).hasSize(5);
        assertThat(two.rearrangements()).extracting(Rearrangement::kind).contains(Rearrangement.Kind.CARBON_SHIFT);
        assertThat(two.questionsTheFate()).isTrue();
        assertThat(result.confidence().weightDependent()).isFalse();
        assertThat(result.confidence().reviewReasons(0)).containsExactly(MapConfidence.Reason.WEIGHTS);
    }

    @Test
    void namesAtomsByTheirAtomClassesWhereTheStructureHasThem() throws Exception {
        // Acetolactate numbered biochemically (C1 carboxyl ... C4 acetyl methyl, C5 the C2 methyl).
        Structure alac = Structure.fromSmiles("[CH3:4][C:3](=O)[C:2]([CH3:5])(O)[C:1](=O)O");
        Structure dhmb = Structure.fromSmiles("CC(C)(O)C(O)C(=O)O");
        MappingResult result = MAPPER.map(new ReactionInput("KARI", List.of(new Participant("alac", alac, 1)),
                List.of(new Participant("dhmb", dhmb, 1))));
        assertThat(result.confidence().weights().get(0).rearrangements().get(0).description())
                .isEqualTo("1,2-shift: the carbon group at alac C5 leaves C2 for its neighbour C3");
    }

    @Test
    void letsTheKnownTransaminationTieAtWeightTwoPass() {
        // Alanine + 2-oxoglutarate: at C-C weight 2 grafting a C2 unit between the molecules ties
        // with the transamination (atom-mapper README); an exchange between molecules is no rearrangement.
        MappingResult result = MAPPER.map(FIXTURES.reaction("ALT", "ala + akg -> pyr + glu"));
        WeightCheck two = result.confidence().weights().get(0);
        assertThat(two.outcome()).isEqualTo(WeightCheck.Outcome.TIED);
        assertThat(two.rearrangements()).isEmpty();
        assertThat(result.confidence().reviewReasons(0)).isEmpty();
    }

    @Test
    void provesWideMarginsRobustWithoutMappingAgain() {
        // Succinate dehydrogenase: cost 1, runner-up 9 dearer, far beyond what a weight change of one can undo.
        MappingResult result = MAPPER.map(FIXTURES.reaction("SDH", "succ -> fum"));
        assertThat(result.confidence().weights()).extracting(WeightCheck::outcome)
                .containsOnly(WeightCheck.Outcome.ROBUST);
        assertThat(result.confidence().reviewReasons(0)).isEmpty();
        assertThat(result.confidence().reviewReasons(result.confidence().margin())).containsExactly(MapConfidence.Reason.MARGIN);
    }

    @Test
    void givesALowerBoundWhenTheNodeBudgetStopsTheRunnerUpSearch() {
        ReactionInput reaction = FIXTURES.reaction("MCC", "mcrcoa + hco3 + atp -> mglcoa + adp + pi");
        MapConfidence exact = MAPPER.map(reaction).confidence();
        MapConfidence cut = new AtomMapper(MappingOptions.defaults().withNodeLimit(10_000)
                .withTimeBudget(Duration.ofSeconds(60))).map(reaction).confidence();
        assertThat(exact.marginProven()).isTrue();
        assertThat(cut.marginProven()).isFalse();
        assertThat(cut.margin()).isBetween(1, exact.margin());
    }

    @Test
    void keepsAllCarbonReactionsApartFromTheirOwnSymmetry() throws Exception {
        // Squalene moved between compartments: every cost-0 map is an automorphism, so the runner-up
        // must cost more (a regression: the carbon check once came after the leaf test).
        Structure squalene = Structure.fromSmiles("CC(=CCCC(=CCCC(=CCCC=C(C)CCC=C(C)CCC=C(C)C)C)C)C");
        MappingResult result = MAPPER.map(new ReactionInput("SQ", List.of(new Participant("a", squalene, 1)),
                List.of(new Participant("b", squalene, 1))));
        assertThat(result.cost()).isZero();
        assertThat(result.confidence().margin()).isPositive();
    }

    @Test
    void saysWhenNoMapSendsTheCarbonsElsewhere() {
        MappingResult result = MAPPER.map(FIXTURES.reaction("CA", "co2 + h2o -> hco3"));
        assertThat(result.confidence().computed()).isTrue();
        assertThat(result.confidence().hasMargin()).isFalse();
        assertThat(result.confidence().note()).isEqualTo("no map sends the carbons elsewhere");
    }

    @Test
    void skipsTheAnalysisForPinsAndWithoutBudget() {
        ReactionInput reaction = FIXTURES.reaction("TPI", "dhap -> g3p");
        assertThat(MAPPER.map(reaction, Reactions.carbons("dhap 5>g3p 5")).confidence().computed()).isFalse();
        MappingResult off = new AtomMapper(MappingOptions.defaults().withConfidenceBudget(Duration.ZERO)).map(reaction);
        assertThat(off.confidence().computed()).isFalse();
        assertThat(off.confidence().reviewReasons(99)).isEmpty();
    }

    /** Every element-preserving bijection of a small reaction, and its cost under the default weights. */
    static final class BruteForce {

        static List<int[]> all(ReactionInput reaction) {
            List<String> left = elements(reaction.reactants());
            List<String> right = elements(reaction.products());
            List<int[]> out = new ArrayList<>();
            extend(left, right, new int[left.size()], new boolean[right.size()], 0, out);
            return out;
        }

        private static void extend(List<String> left, List<String> right, int[] map, boolean[] used, int i,
                                   List<int[]> out) {
            if (i == left.size()) {
                out.add(map.clone());
                return;
            }
            for (int x = 0; x < right.size(); x++) {
                if (!used[x] && right.get(x).equals(left.get(i))) {
                    used[x] = true;
                    map[i] = x;
                    extend(left, right, map, used, i + 1, out);
                    used[x] = false;
                }
            }
        }

        static int cost(ReactionInput reaction, int[] map) {
            int[][] before = bonds(reaction.reactants());
            int[][] after = bonds(reaction.products());
            List<String> left = elements(reaction.reactants());
            int total = 0;
            for (int u = 0; u < map.length; u++) {
                for (int v = u + 1; v < map.length; v++) {
                    int b = before[u][v];
                    int a = after[map[u]][map[v]];
                    if (a != b) {
                        total += a == 0 || b == 0 ? (left.get(u).equals("C") && left.get(v).equals("C") ? 3 : 1) : 1;
                    }
                }
            }
            return total;
        }

        static List<AtomTransition> carbons(ReactionInput reaction, int[] map) {
            List<AtomRef> left = refs(reaction.reactants());
            List<AtomRef> right = refs(reaction.products());
            List<String> elements = elements(reaction.reactants());
            List<AtomTransition> out = new ArrayList<>();
            for (int u = 0; u < map.length; u++) {
                if (elements.get(u).equals("C")) {
                    out.add(new AtomTransition(left.get(u), right.get(map[u]), "C"));
                }
            }
            return out;
        }

        private static List<String> elements(List<Participant> side) {
            List<String> out = new ArrayList<>();
            for (Participant p : side) {
                for (int c = 0; c < p.coefficient(); c++) {
                    MoleculeGraph g = p.structure().graph();
                    for (int i = 0; i < g.atomCount(); i++) {
                        out.add(g.element(i));
                    }
                }
            }
            return out;
        }

        private static List<AtomRef> refs(List<Participant> side) {
            List<AtomRef> out = new ArrayList<>();
            for (Participant p : side) {
                for (int c = 1; c <= p.coefficient(); c++) {
                    for (int i = 1; i <= p.structure().heavyAtomCount(); i++) {
                        out.add(new AtomRef(p.species(), c, i));
                    }
                }
            }
            return out;
        }

        private static int[][] bonds(List<Participant> side) {
            int n = elements(side).size();
            int[][] b = new int[n][n];
            int off = 0;
            for (Participant p : side) {
                for (int c = 0; c < p.coefficient(); c++) {
                    MoleculeGraph g = p.structure().graph();
                    for (int i = 0; i < g.atomCount(); i++) {
                        for (int j = 0; j < g.atomCount(); j++) {
                            b[off + i][off + j] = g.bond(i, j);
                        }
                    }
                    off += g.atomCount();
                }
            }
            return b;
        }
    }
}
