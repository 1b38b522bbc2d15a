package io.github.atomledger.atommapper.structure.internal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.atommapper.structure.HostileStructures;
import io.github.atomledger.atommapper.structure.MoleculeGraph;
import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.atommapper.structure.StructureException;
import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Our automorphism orbits against an outside reference, CDK's automorphism partition
 * ({@link CdkOrbits}), compared atom by atom, on molecules whose orbit counts are known; and the
 * work limit. The whole of yeast-GEM is compared in {@link OrbitsYeastTest}.
 */
class OrbitsTest {

    /*
     * Orbit counts of the heavy-atom graph (elements and bond codes; no hydrogens, charges or
     * stereo), counted from the drawings by symmetry (common practice); where a 13C NMR signal
     * count says the same for the carbons it is named (from memory).
     * - benzene 1; naphthalene 3 (alpha, beta, fusion carbons: three 13C signals); cubane 1;
     *   adamantane 2 (CH and CH2: two 13C signals); C60 1 (icosahedral, one 13C signal).
     * - citric acid 9: C3, its O, its carboxyl C, =O and -O; the two CH2, the two outer carboxyl
     *   carbons and their =O and -O pairs (13 atoms).
     * - succinic and fumaric acid 4: CH2 or CH, carboxyl C, =O, -O, each a pair.
     * - phytic acid (myo-inositol hexakisphosphate) 5: without stereo all six ring positions are
     *   alike, so ring C, bridging O, P, P=O and the two P-OH (36 atoms).
     * - coenzyme A 46 of 48 atoms: the gem-dimethyl pair and the two OH of the 3'-phosphate;
     *   each diphosphate P has one =O and one -OH, which differ by bond code.
     * - NAD+ 44 of 44: no two atoms alike. ATP 30 of 31: the two OH of the gamma phosphate.
     * - porphine 7 as drawn (the tautomer with NH on two opposite pyrroles; CDK's Daylight
     *   aromaticity leaves its bonds as drawn): NH and =N nitrogens, two kinds each of alpha and
     *   beta carbons, and the four meso carbons (the D2h symmetry of free-base porphine).
     */
    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = ';', textBlock = """
            benzene; c1ccccc1; 1
            naphthalene; c1ccc2ccccc2c1; 3
            cubane; C12C3C4C1C5C2C3C45; 1
            adamantane; C1C2CC3CC1CC(C2)C3; 2
            citric acid; OC(=O)CC(O)(CC(=O)O)C(=O)O; 9
            succinic acid; OC(=O)CCC(=O)O; 4
            fumaric acid; OC(=O)/C=C/C(=O)O; 4
            phytic acid; OP(=O)(O)OC1C(OP(=O)(O)O)C(OP(=O)(O)O)C(OP(=O)(O)O)C(OP(=O)(O)O)C1OP(=O)(O)O; 5
            coenzyme A; SCCNC(=O)CCNC(=O)C(O)C(C)(C)COP(=O)(O)OP(=O)(O)OCC1OC(C(O)C1OP(=O)(O)O)n1cnc2c(N)ncnc12; 46
            NAD+; NC(=O)c1ccc[n+](c1)C1OC(COP(=O)(O)OP(=O)(O)OCC2OC(C(O)C2O)n2cnc3c(N)ncnc23)C(O)C1O; 44
            ATP; Nc1ncnc2c1ncn2C1OC(COP(=O)(O)OP(=O)(O)OP(=O)(O)O)C(O)C1O; 30
            porphine; C1=CC2=NC1=CC3=CC=C(N3)C=C4C=CC(=N4)C=C5C=CC(=C2)N5; 7
            """)
    void textbookMoleculesHaveTheirKnownOrbitsAsCdkFindsThem(String name, String smiles, int orbits)
            throws StructureException {
        assertOrbits(Structure.fromSmiles(smiles).graph(), orbits);
    }

    @Test
    void fullereneHasOneOrbitAsCdkFinds() throws StructureException {
        assertOrbits(Structure.fromSmiles(HostileStructures.C60).graph(), 1);
    }

    /*
     * Graphs where every atom has the same number of neighbours, so colour refinement leaves one
     * cell and only the search can find the orbits: unions of rings (ring sizes differ), and the
     * C8H8 cage with two cyclopropane and two cyclobutane rings (the cuneane skeleton, from
     * memory): its mirror planes leave three orbits, the two ends of the bond that joins the
     * cyclopropanes, their other four atoms, and the two ends of the bond the cyclobutanes share.
     */
    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = ';', textBlock = """
            cyclopropanes and cyclohexane; C1CC1.C1CCCCC1.C1CC1; 2
            cyclohexane and two cyclopropanes; C1CCCCC1.C1CC1.C1CC1; 2
            cuneane skeleton; C12C3C1C4C5C(C52)C34; 3
            """)
    void regularGraphsGetOrbitsFinerThanColourRefinement(String name, String smiles, int orbits)
            throws StructureException, StepBudget.Exhausted {
        MoleculeGraph g = Structure.fromSmiles(smiles).graph();
        assertThat(GraphArrays.of(g).colourRefinementCells()).isEqualTo(1);
        assertOrbits(g, orbits);
    }

    @Test
    void workLimitStopsTheSameInputAtTheSameStep() throws StructureException {
        GraphArrays c60 = GraphArrays.of(Structure.fromSmiles(HostileStructures.C60).graph());
        StepBudget first = new StepBudget(5_000);
        StepBudget second = new StepBudget(5_000);
        assertThatThrownBy(() -> c60.orbits(first)).isInstanceOf(StepBudget.Exhausted.class);
        assertThatThrownBy(() -> c60.orbits(second)).isInstanceOf(StepBudget.Exhausted.class);
        assertThat(first.used()).isGreaterThan(5_000).isEqualTo(second.used());
    }

    @Test
    void sameGraphCostsTheSameStepsEveryTime() throws StructureException, StepBudget.Exhausted {
        GraphArrays pib = GraphArrays.of(Structure.fromSmiles(HostileStructures.all().get(0).smiles()).graph());
        StepBudget first = new StepBudget(Long.MAX_VALUE);
        StepBudget second = new StepBudget(Long.MAX_VALUE);
        assertThat(pib.orbits(first)).isEqualTo(pib.orbits(second));
        assertThat(first.used()).isEqualTo(second.used()).isLessThan(GraphBuilder.SYMMETRY_STEP_LIMIT / 10);
    }

    private static void assertOrbits(MoleculeGraph g, int count) {
        int[] ours = CdkOrbits.ours(g);
        assertThat(ours).isEqualTo(CdkOrbits.orbits(CdkOrbits.container(g)));
        assertThat(Arrays.stream(ours).distinct().count()).isEqualTo(count);
    }
}
