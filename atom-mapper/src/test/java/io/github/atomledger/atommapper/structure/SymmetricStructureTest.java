package io.github.atomledger.atommapper.structure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.atommapper.structure.internal.GraphBuilder;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Issue 7: structure ingestion ends on inputs with many interchangeable parts, which made CDK's
 * automorphism computation run for minutes (twenty disconnected methanes, found by
 * {@link StructureFuzzTest}; a chain with two identical branches on every atom, 2^60
 * symmetries). The orbits are now our own computation with a step limit; each hostile structure
 * of {@link HostileStructures} is read with its exact orbit count. The timeouts are hang guards
 * only, far above the milliseconds these take, not performance assertions.
 */
class SymmetricStructureTest {

    static List<HostileStructures.Case> hostile() {
        return HostileStructures.all();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("hostile")
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void hostileStructureIsReadWithItsExactOrbits(HostileStructures.Case c) throws StructureException {
        assertThat(orbitCount(Structure.fromSmiles(c.smiles()))).isEqualTo(c.orbits());
    }

    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void manyIdenticalPiecesShareOneOrbitPerPosition() throws StructureException {
        // Ethanol pieces: the methyl carbons, the CH2 carbons and the oxygens are three orbits.
        Structure ethanols = Structure.fromSmiles(HostileStructures.copies("CCO", 40));
        assertThat(orbitCount(ethanols)).isEqualTo(3);

        Structure neopentanes = Structure.fromSmiles(HostileStructures.copies("C(C)(C)(C)C", 30));
        assertThat(orbitCount(neopentanes)).isEqualTo(2);
    }

    @Test
    void differentPiecesStayInDifferentOrbits() throws StructureException {
        // Water and methanol oxygens are not exchangeable; the two waters are.
        Structure s = Structure.fromSmiles("O.CO.O");
        MoleculeGraph g = s.graph();
        assertThat(g.atomCount()).isEqualTo(4);
        assertThat(orbitCount(s)).isEqualTo(3);
        assertThat(g.orbit(3)).isEqualTo(0);
    }

    @Test
    void atomWithManyHeavyNeighboursIsRead() throws StructureException {
        // Refused before (more than 12 neighbours) because CDK's symmetry search exploded on it.
        Structure s = Structure.fromSmiles("[Fe]" + "(C)".repeat(13));
        assertThat(orbitCount(s)).isEqualTo(2);
    }

    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void structureBeyondTheStepLimitIsRefusedNamingTextLimitAndSize() {
        // 1 500 units, 4 501 atoms: about 50 million steps, past the limit of 20 million.
        String polymer = "C" + "C(C)(C)".repeat(1500);
        assertThatThrownBy(() -> Structure.fromSmiles(polymer))
                .isInstanceOf(StructureException.class)
                .hasMessage("symmetry of '" + polymer + "' is too complex to analyse within "
                        + GraphBuilder.SYMMETRY_STEP_LIMIT + " steps (4501 heavy atoms)");
    }

    private static long orbitCount(Structure s) {
        MoleculeGraph g = s.graph();
        Set<Integer> orbits = new HashSet<>();
        for (int i = 0; i < g.atomCount(); i++) {
            orbits.add(g.orbit(i));
        }
        return orbits.size();
    }
}
