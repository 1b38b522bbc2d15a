package io.github.atomledger.atommapper.mapping;

import static io.github.atomledger.atommapper.mapping.CentralCarbonMappingTest.assertCarbonsOf;
import static io.github.atomledger.atommapper.mapping.CentralCarbonMappingTest.mapped;
import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Issue 3: reaction classes of amino-acid and ketone-body catabolism. The carbon fates are common
 * practice (textbook biochemistry, written from memory). Hydrogen-only carriers (NAD+, FAD) are
 * left out; the heavy atoms balance without them.
 */
class CatabolismMappingTest {

    private static final Reactions FIXTURES = Metabolites.all();
    private static final AtomMapper MAPPER = new AtomMapper(MappingOptions.defaults());

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
        transamination keeps both skeletons | asp + akg -> oaa + glu | asp 2>oaa 5; asp 3>oaa 4; asp 4>oaa 2; asp 7>oaa 7; akg 8>glu 8; akg 6>glu 2; akg 5>glu 3; akg 4>glu 4; akg 2>glu 5
        2-oxo acid decarboxylation loses C1 | kic + coa -> ivcoa + co2 | kic 7>co2 2; kic 5>ivcoa 5; kic 4>ivcoa 4; kic 2>ivcoa 2; kic 1>ivcoa 1; kic 3>ivcoa 3
        thiolysis gives two acetyl-CoA      | acacoa + coa -> 2 accoa  | acacoa 1>accoa 1; acacoa 2>accoa 2; acacoa 4>accoa#2 1; acacoa 5>accoa#2 2
        carboxylation adds bicarbonate carbon | mcrcoa + hco3 + atp -> mglcoa + adp + pi | hco3 2>mglcoa 2; mcrcoa 1>mglcoa 4; mcrcoa 3>mglcoa 6; mcrcoa 2>mglcoa 5; mcrcoa 4>mglcoa 7; mcrcoa 5>mglcoa 8
        CoA transfer moves only CoA         | succoa + acac -> succ + acacoa | succoa 2>succ 2; succoa 4>succ 4; succoa 5>succ 5; succoa 6>succ 6; acac 1>acacoa 1; acac 2>acacoa 2; acac 4>acacoa 4; acac 5>acacoa 5
        phenylalanine hydroxylation keeps nine carbons | phe + o2 + bh4 -> tyr + h2o + bh2 | phe 2>tyr 2; phe 3>tyr 3; phe 4>tyr 4; phe 5>tyr 5; phe 6>tyr 6; phe 7>tyr 7; phe 8>tyr 9; phe 9>tyr 10; phe 10>tyr 11
        2-amino-3-oxobutanoate cleavage     | akb + coa -> gly + accoa | akb 1>accoa 1; akb 2>accoa 2; akb 4>gly 2; akb 6>gly 3
        """)
    void mapsCatabolicReactionClassesAsCommonPractice(String id, String text, String expected) {
        mapped(id, text, expected, "mapped");
    }

    @Test
    void reportsBothMethylmalonylCoaMutaseShiftsAsAmbiguous() {
        // Carboxyl shift and thioester shift each break one C-C bond and form one (cost 2 x 2);
        // a known tie of minimum chemical distance (Latendresse et al. 2012 discuss such cases).
        ReactionInput reaction = FIXTURES.reaction("MCM", "mmcoa -> succoa");
        MappingResult result = MAPPER.map(reaction);
        assertThat(result.status()).isEqualTo(MappingStatus.AMBIGUOUS);
        assertThat(result.cost()).isEqualTo(4).isEqualTo(result.lowerBound());
        List<List<AtomTransition>> all = new ArrayList<>(result.alternatives());
        all.add(result.carbonTransitions());
        assertThat(all).hasSize(2);
        String thioesterShift = "mmcoa 2>succoa 2; mmcoa 4>succoa 4; mmcoa 5>succoa 5; mmcoa 6>succoa 6";
        String carboxylShift = "mmcoa 2>succoa 2; mmcoa 4>succoa 5; mmcoa 5>succoa 4; mmcoa 6>succoa 6";
        assertThat(all).anySatisfy(m -> assertCarbonsOf(reaction, result(reaction, m), carboxylShift));
        assertThat(all).anySatisfy(m -> assertCarbonsOf(reaction, result(reaction, m), thioesterShift));
    }

    private static MappingResult result(ReactionInput reaction, List<AtomTransition> carbons) {
        return new MappingResult(reaction.reactionId(), MappingStatus.MAPPED, carbons, List.of(), 0, 0, List.of(),
                List.of(), List.of(), "", new TreeMap<>(), "", java.time.Duration.ZERO);
    }

    @Test
    void refusesDecarboxylationWithCarbonDioxideLeftOut() {
        MappingResult result = MAPPER.map(FIXTURES.reaction("PDC", "pyr -> acald"));
        assertThat(result.status()).isEqualTo(MappingStatus.UNMAPPABLE);
        assertThat(result.elementDifference()).containsExactlyEntriesOf(new TreeMap<>(Map.of("C", -1L, "O", -2L)));
        assertThat(result.reason()).isEqualTo("heavy atoms do not balance (products minus reactants: C -1, O -2)");
        assertThat(result.atomMap()).isEmpty();
    }

    @Test
    void tracesThreeOfAcetoacetateCarbonsToLeucineAndOneToCarbonDioxide() {
        Map<AtomRef, String> origin = chain(new String[][] {
            {"BCAT", "leu + akg -> kic + glu"},
            {"BCKDH", "kic + coa -> ivcoa + co2"},
            {"IVD", "ivcoa -> mcrcoa"},
            {"MCC", "mcrcoa + hco3 + atp -> mglcoa + adp + pi"},
            {"MGH", "mglcoa + h2o -> hmgcoa"},
            {"HMGCL", "hmgcoa -> acac + accoa"},
        }, "leu", "hco3");
        assertThat(countBy(origin, "acac")).containsExactlyInAnyOrderEntriesOf(Map.of("leu", 3, "hco3", 1));
        assertThat(countBy(origin, "accoa")).containsExactlyInAnyOrderEntriesOf(Map.of("leu", 2));
        assertThat(countBy(origin, "co2")).containsExactlyInAnyOrderEntriesOf(Map.of("leu", 1));
    }

    @Test
    void splitsIsoleucineCarbonsTwoToAcetylThreeToPropionylOneToCarbonDioxide() {
        Map<AtomRef, String> origin = chain(new String[][] {
            {"BCAT", "ile + akg -> kmv + glu"},
            {"BCKDH", "kmv + coa -> mbcoa + co2"},
            {"MBD", "mbcoa -> tigcoa"},
            {"ECH", "tigcoa + h2o -> mhbcoa"},
            {"HAD", "mhbcoa -> macoa"},
            {"THL", "macoa + coa -> ppcoa + accoa"},
        }, "ile");
        assertThat(countBy(origin, "accoa")).containsExactlyInAnyOrderEntriesOf(Map.of("ile", 2));
        assertThat(countBy(origin, "ppcoa")).containsExactlyInAnyOrderEntriesOf(Map.of("ile", 3));
        assertThat(countBy(origin, "co2")).containsExactlyInAnyOrderEntriesOf(Map.of("ile", 1));
    }

    /**
     * Maps each step and follows the carbons of the {@code tracked} species through the chain:
     * returns, for each carbon where a tracked carbon ends up, the species it started in.
     */
    private static Map<AtomRef, String> chain(String[][] steps, String... tracked) {
        Map<AtomRef, String> where = new HashMap<>();
        for (String[] step : steps) {
            ReactionInput reaction = FIXTURES.reaction(step[0], step[1]);
            for (Participant p : reaction.reactants()) {
                if (List.of(tracked).contains(p.species())) {
                    for (int i = 1; i <= p.structure().heavyAtomCount(); i++) {
                        if (p.structure().graph().element(i - 1).equals("C")) {
                            where.putIfAbsent(new AtomRef(p.species(), 1, i), p.species());
                        }
                    }
                }
            }
            MappingResult result = MAPPER.map(reaction);
            assertThat(result.provenOptimal()).as("%s", result).isTrue();
            Map<AtomRef, String> next = new HashMap<>();
            List<String> consumed = reaction.reactants().stream().map(Participant::species).toList();
            where.forEach((atom, source) -> {
                if (!consumed.contains(atom.species())) {
                    next.put(atom, source);
                }
            });
            for (AtomTransition t : result.carbonTransitions()) {
                String source = where.get(t.from());
                if (source != null) {
                    next.put(t.to(), source);
                }
            }
            where = next;
        }
        return where;
    }

    private static Map<String, Integer> countBy(Map<AtomRef, String> origin, String species) {
        Map<String, Integer> counts = new HashMap<>();
        origin.forEach((atom, source) -> {
            if (atom.species().equals(species)) {
                counts.merge(source, 1, Integer::sum);
            }
        });
        return counts;
    }
}
