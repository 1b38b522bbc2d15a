package io.github.atomledger.atommapper.structure.internal;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.structure.MoleculeGraph;
import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.atommapper.structure.StructureException;
import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Every distinct SMILES of yeast-GEM (834 of them; skipped without {@code ../shared/data}): our
 * orbits equal CDK's automorphism partition atom by atom. Colour refinement alone already gives
 * the orbits for all of them, so {@link OrbitsTest} covers the graphs where it does not.
 */
class OrbitsYeastTest {

    @Test
    void everyYeastStructureHasTheOrbitsCdkFinds() throws IOException {
        List<String> smiles = YeastStructures.smiles();
        List<String> differing = new ArrayList<>();
        List<String> unreadable = new ArrayList<>();
        for (String s : smiles) {
            MoleculeGraph g;
            try {
                g = Structure.fromSmiles(s).graph();
            } catch (StructureException e) {
                unreadable.add(e.getMessage());
                continue;
            }
            if (!Arrays.equals(CdkOrbits.ours(g), CdkOrbits.orbits(CdkOrbits.container(g)))) {
                differing.add(s);
            }
        }
        assertThat(unreadable).isEmpty();
        assertThat(differing).isEmpty();
        assertThat(smiles).hasSizeGreaterThan(800);
    }
}
