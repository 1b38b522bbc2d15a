package io.github.atomledger.checker.check.structure;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.checker.SharedData;
import io.github.atomledger.checker.TestModels;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.mapping.Coverage;
import io.github.atomledger.checker.check.mapping.MapStatus;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.MappingConfig;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunListener;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

/**
 * Issue 15, check against an open dataset: the BiGG e_coli_core model ({@code ../shared/data},
 * unmodified first commit) carries no structures, only MIRIAM cross-references. A small SD file
 * in the layout of the public ChEBI dump ({@code chebi-central.sdf}: 45 central-carbon compounds,
 * ChEBI ids and SMILES written from memory, see {@code chebi-central.tsv}) resolves its species
 * through their {@code chebi} annotations. Every structure found must agree with the model's own
 * formula in its heavy atoms (the model is the outside reference for the remembered structures),
 * and the reactions that become mappable are counted (recorded in BENCHMARKS.md). The same
 * structures as a table keyed by {@code chebi} give the same result. Skips without the data.
 */
class EcoliChebiStructuresTest {

    private static ModelResult run(Path structures) {
        Path model = SharedData.require("e_coli_core.original.xml");
        MappingConfig mapping = new MappingConfig(true, null, MappingOptions.defaults().withTimeBudget(Duration.ofSeconds(60)),
                2, null, List.of(structures), null, null);
        RunConfig config = RunConfig.defaults(model.getParent(), List.of(model.getFileName().toString())).withMapping(mapping);
        return new Engine().run(config, RunListener.SILENT).models().get(0);
    }

    @Test
    void aChebiStyleSdFileResolvesEcoliCoreSpeciesThroughTheirChebiAnnotations() {
        ModelResult m = run(TestModels.fixture("structure/sources/chebi-central.sdf"));
        Map<String, SpeciesStructures.Resolved> found = m.mapping().structures().bySpecies();
        // 59 of the 72 species: 12 carry no ChEBI id at all (outside D-glucose, glutamine,
        // glutamate, D-lactate and L-malate in both compartments, ribulose and xylulose
        // 5-phosphate, cis-aconitate) and the file has no record for D-fructose.
        assertThat(found.values()).allSatisfy(r -> assertThat(r.source()).isEqualTo(SpeciesStructures.Source.CROSS_REFERENCE));
        assertThat(found).hasSize(59);
        List<Finding> findings = m.allFindings();
        assertThat(findings).noneMatch(f -> f.ruleId().equals("structure.formula-mismatch"));
        assertThat(findings).noneMatch(f -> f.ruleId().equals("structure.invalid"));
        // Erythrose 4-phosphate is in the file as the neutral acid (the only id the model lists
        // that the file holds): a protonation difference, reported as such.
        assertThat(findings.stream().filter(f -> f.ruleId().equals("structure.protonation")).map(Finding::elementId))
                .containsExactly("M_e4p_c");

        Map<MapStatus, Integer> statuses = new TreeMap<>();
        for (ReactionResult r : m.reactions()) {
            statuses.merge(r.mapping().status(), 1, Integer::sum);
        }
        Coverage c = Coverage.of(m.model(), m.mapping(), id -> m.reactions().stream().filter(r -> r.id().equals(id))
                .findFirst().orElseThrow().reactionClass());
        assertThat(c.considered()).isEqualTo(c.mappable() + c.blocked());
        // 51 of the 74 reactions of a mapped class (internal, transport, ATP maintenance) have every
        // structure; 50 map (R_CYTBD has half an O2). The structures that would unblock most: L-malate (5 reactions alone).
        assertThat(c.considered()).isEqualTo(74);
        assertThat(c.mappable()).as("statuses %s", statuses).isEqualTo(51);
        assertThat(statuses).containsEntry(MapStatus.MAPPED, 50);
        assertThat(c.missing()).extracting(Coverage.Missing::species).startsWith("M_mal__L_c", "M_ru5p__D_c");

        Path table = TestModels.fixture("structure/sources/chebi-central.tsv");
        SpeciesStructures viaTable = new StructureResolver().resolve(m.model(),
                StructureLibrary.load(List.of(table), table.getParent(), SdFile.DEFAULT_ID_FIELD, null), Map.of());
        assertThat(viaTable.bySpecies().keySet()).isEqualTo(found.keySet());
        found.forEach((id, r) -> assertThat(viaTable.get(id).orElseThrow().structure().fingerprint())
                .as(id).isEqualTo(r.structure().fingerprint()));
    }
}
