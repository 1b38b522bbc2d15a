package io.github.atomledger.checker.check.structure;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.SharedData;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.balance.BalanceCalculator;
import io.github.atomledger.checker.check.balance.SpeciesChemistry;
import io.github.atomledger.checker.model.LoadOptions;
import io.github.atomledger.checker.model.ModelLoader;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.check.mapping.MappingData;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * yeast-GEM 9.0.2 with its SMILES side table (1,800 rows; provenance in ../shared/data/yeast-GEM.SOURCE.md,
 * which notes that for 869 of the 1,798 species with a charge the SMILES net formal charge differs from the
 * declared one, for example s_0006, and that the carbon count differs for about 60, for example s_0510).
 */
class YeastGemStructureTest {

    private static List<Finding> findings;
    private static StructureTable table;

    @BeforeAll
    static void run() {
        ModelView model = new ModelLoader(LoadOptions.defaults()).load(SharedData.require("yeast-GEM.xml.gz"), "yeast-GEM.xml.gz");
        table = StructureTable.load(SharedData.require("yeast-GEM.structures.tsv"), "yeast-GEM.structures.tsv");
        BalanceCalculator calc = new BalanceCalculator();
        Map<String, SpeciesChemistry> chem = calc.chemistry(model);
        SpeciesStructures structures = new StructureResolver().resolve(model, table, Map.of());
        CheckContext context = new CheckContext(model, chem, calc.balances(model, chem),
                new MappingData(true, Map.of(), Map.of(), Map.of(), structures));
        findings = new ArrayList<>();
        for (StructureFormulaCheck c : List.of(StructureFormulaCheck.mismatch(), StructureFormulaCheck.protonation())) {
            findings.addAll(c.check(context));
        }
    }

    private static Optional<Finding> of(String species) {
        return findings.stream().filter(f -> f.elementId().equals(species)).findFirst();
    }

    @Test
    void readsTheWholeTable() {
        assertThat(table.entries()).hasSize(1800);
    }

    @Test
    void reportsTheNeutralSmilesOfAChargedSpeciesAsProtonationOnly() {
        // s_0006: declared C7H8N5O8P2 3-; the SMILES is the fully protonated acid, C7H11N5O8P2 (three H more).
        // Issue #13: protonation differences are one finding per model, the species listed in its data.
        assertThat(of("s_0006")).isEmpty();
        Finding grouped = protonation();
        List<String> species = List.of(grouped.data().get("species").split(","));
        List<String> protons = List.of(grouped.data().get("protons").split(","));
        assertThat(protons.get(species.indexOf("s_0006"))).isEqualTo("+3");
    }

    private static Finding protonation() {
        return findings.stream().filter(f -> f.ruleId().equals("structure.protonation")).findFirst().orElseThrow();
    }

    @Test
    void reportsAHeavyAtomDifferenceAsAnError() {
        // s_0510 chitosan: the formula is one monomer unit, the SMILES an oligomer (and carbamate-capped).
        assertThat(of("s_0510")).get().satisfies(f -> {
            assertThat(f.ruleId()).isEqualTo("structure.formula-mismatch");
            assertThat(f.data()).containsKey("delta.C");
        });
    }

    @Test
    void leavesTheProtonAlone() {
        assertThat(of("s_0794")).isEmpty();
    }

    @Test
    void countsChargeDifferencesLikeTheProvenanceNote() {
        long protonation = Long.parseLong(protonation().data().get("count"));
        long chargeDiffers = protonation + findings.stream().filter(f -> f.data().containsKey("delta.charge")).count();
        assertThat(findings.stream().filter(f -> f.ruleId().equals("structure.protonation"))).hasSize(1);
        long mismatch = findings.stream().filter(f -> f.ruleId().equals("structure.formula-mismatch")).count();
        System.out.printf("yeast-GEM structures: %d protonation, %d mismatch, %d invalid, %d with a charge difference%n",
                protonation, mismatch, findings.size() - 1 - mismatch, chargeDiffers);
        // The provenance note counts 869 species whose SMILES net formal charge differs from the declared charge.
        assertThat(chargeDiffers).isEqualTo(869);
        assertThat(protonation).isEqualTo(850);
        assertThat(mismatch).isEqualTo(74);
    }
}
