package io.github.atomledger.atommapper.mapping;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/**
 * Atom classes are readable positions only (issue #14): the same reaction with and without them
 * gets the same map, cost, status and mapped SMILES (whose numbers are the mapper's own, never the
 * species' classes), and only the texts that name atoms use the labels. Citrate synthase with
 * citrate numbered C1..C6 from the pro-R carboxyl (common practice); the arms are equivalent by
 * constitution, so the mapper asks for a pin (see {@code CentralCarbonMappingTest}).
 */
class LabelledMappingTest {

    private static final AtomMapper MAPPER = new AtomMapper(MappingOptions.defaults());

    private static Reactions fixtures(boolean labelled) {
        return new Reactions()
                .mol("h2o", "O", "H2O")
                .mol("coa", Metabolites.COA, "C21H36N7O16P3S")
                .mol("accoa", labelled ? "[CH3:2][C:1](=O)" + Metabolites.COA : "CC(=O)" + Metabolites.COA,
                        "C23H38N7O17P3S")
                .mol("oaa", labelled ? "O[C:4](=O)[CH2:3][C:2](=O)[C:1](=O)O" : "OC(=O)CC(=O)C(=O)O", "C4H4O5")
                .mol("cit", labelled ? "O[C:1](=O)[CH2:2][C:3](O)([CH2:4][C:5](=O)O)[C:6](=O)O"
                        : "OC(=O)CC(O)(CC(=O)O)C(=O)O", "C6H8O7");
    }

    @Test
    void atomClassesChangeNoMapOnlyTheNamesInNotes() {
        MappingResult plain = MAPPER.map(fixtures(false).reaction("CS", "accoa + oaa + h2o -> cit + coa"));
        MappingResult labelled = MAPPER.map(fixtures(true).reaction("CS", "accoa + oaa + h2o -> cit + coa"));
        assertThat(labelled.status()).isEqualTo(plain.status());
        assertThat(labelled.cost()).isEqualTo(plain.cost());
        assertThat(labelled.atomMap()).isEqualTo(plain.atomMap());
        assertThat(labelled.alternatives()).isEqualTo(plain.alternatives());
        assertThat(labelled.mappedSmiles()).isEqualTo(plain.mappedSmiles());
        assertThat(plain.stereoNotes()).singleElement().asString().contains("prochiral centre 5");
        assertThat(labelled.stereoNotes()).singleElement().asString()
                .contains("the branches at atoms C2 and C4 of prochiral centre C3");
    }
}
