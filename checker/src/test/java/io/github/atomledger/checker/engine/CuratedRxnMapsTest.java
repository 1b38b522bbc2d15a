package io.github.atomledger.checker.engine;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.ctfile.RxnMaps;
import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.atommapper.mapping.ReactionInput;
import io.github.atomledger.checker.SourceFixtures;
import io.github.atomledger.checker.annotate.AnnotationPlan;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.mapping.MapStatus;
import io.github.atomledger.checker.transitions.TransitionAnnotation;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 15: curated maps brought in as RXN files are judged like curated maps in the model. The
 * reaction is enolase (2-phospho-D-glycerate -> phosphoenolpyruvate + water): its three carbons
 * keep their skeleton (textbook glycolysis, from memory), so a file that swaps two of them is a
 * valid carbon map that differs from the minimum bond-edit map.
 */
class CuratedRxnMapsTest {

    @TempDir
    Path dir;

    private ModelResult run(Path curated) throws IOException {
        return new Engine().run(SourceFixtures.run(SourceFixtures.all(dir), curated), RunListener.SILENT).models().get(0);
    }

    private static ReactionResult reaction(ModelResult m, String id) {
        return m.reactions().stream().filter(r -> r.id().equals(id)).findFirst().orElseThrow();
    }

    private static ReactionInput input(ModelResult m, String id) {
        ReactionResult r = reaction(m, id);
        return MappingInputs.inputOf(r.reaction(), r.balance(), m.mapping().structures()).orElseThrow();
    }

    @Test
    void rxnFilesAgreeingDifferingAndBrokenAreJudgedAndNamed() throws Exception {
        ModelResult plain = run(null);
        assertThat(reaction(plain, "R_ENO").mapping().status()).isEqualTo(MapStatus.MAPPED);
        assertThat(reaction(plain, "R_PYK").mapping().status()).isEqualTo(MapStatus.MAPPED);
        List<AtomTransition> eno = reaction(plain, "R_ENO").mapping().carbons();
        assertThat(eno).hasSize(3);

        Path maps = Files.createDirectories(dir.resolve("curated"));
        // R_PYK: the inferred map itself, written as a curated file: agrees.
        Files.writeString(maps.resolve("R_PYK.rxn"), RxnMaps.write("R_PYK", "", input(plain, "R_PYK"),
                reaction(plain, "R_PYK").mapping().carbons()));
        // R_ENO: the first and last carbon swapped.
        List<AtomTransition> swapped = new ArrayList<>(eno);
        AtomTransition a = eno.get(0);
        AtomTransition b = eno.get(2);
        swapped.set(0, new AtomTransition(a.from(), b.to(), "C"));
        swapped.set(2, new AtomTransition(b.from(), a.to(), "C"));
        Files.writeString(maps.resolve("R_ENO.rxn"), RxnMaps.write("R_ENO", "", input(plain, "R_ENO"), swapped));
        // R_X1: no structure for M_x_c, nothing to check against; R_GHOST: no such reaction;
        // R_ACP: not an RXN file at all.
        Files.writeString(maps.resolve("R_X1.rxn"), Files.readString(maps.resolve("R_PYK.rxn")));
        Files.writeString(maps.resolve("R_GHOST.rxn"), Files.readString(maps.resolve("R_PYK.rxn")));
        Files.writeString(maps.resolve("R_ACP.rxn"), "$RXN\n\n\n\n  1  x\n");

        ModelResult m = run(maps);
        assertThat(m.mapping().curated().get("R_PYK").agrees()).isTrue();
        List<Finding> findings = m.allFindings();
        Finding differs = findings.stream().filter(f -> f.ruleId().equals("mapping.curated-differs")).findFirst().orElseThrow();
        assertThat(differs.elementId()).isEqualTo("R_ENO");
        // The files lie outside the model's directory here, so they are named by absolute path.
        assertThat(differs.data().get("file")).endsWith("/curated/R_ENO.rxn");
        assertThat(differs.data()).containsEntry("differingCount", "2");
        assertThat(differs.message()).contains("R_ENO.rxn)").contains(a.from() + "->" + b.to());
        assertThat(findings.stream().filter(f -> f.ruleId().equals("mapping.curated-file")))
                .extracting(Finding::elementId, f -> f.data().get("fileLine"))
                .containsExactlyInAnyOrder(org.assertj.core.groups.Tuple.tuple("R_X1", "0"),
                        org.assertj.core.groups.Tuple.tuple("ledgerella_lower_refs", "0"),
                        org.assertj.core.groups.Tuple.tuple("R_ACP", "5"));
        assertThat(findings.stream().filter(f -> f.ruleId().equals("mapping.curated-file") && f.elementId().equals("R_X1"))
                .findFirst().orElseThrow().message()).contains("no structure for M_x_c");

        // annotate writes the files' maps as curated annotations (the differing one too: it is a
        // valid carbon map, and the curator's word).
        var plan = AnnotationPlan.of(m);
        assertThat(plan.get("R_ENO").origin()).isEqualTo(TransitionAnnotation.CURATED);
        assertThat(plan.get("R_ENO").carbons()).isEqualTo(swapped.stream().sorted().toList());
        assertThat(plan.get("R_PYK").origin()).isEqualTo(TransitionAnnotation.CURATED);
    }

    @Test
    void coverageFindingsRankMissingStructuresAndNameGenericSpecies() throws IOException {
        ModelResult m = run(null);
        Finding missing = m.allFindings().stream().filter(f -> f.ruleId().equals("mapping.structure-missing"))
                .collect(java.util.stream.Collectors.collectingAndThen(java.util.stream.Collectors.toList(), l -> {
                    assertThat(l).hasSize(1);
                    return l.get(0);
                }));
        assertThat(missing.elementId()).isEqualTo("ledgerella_lower_refs");
        assertThat(missing.data()).containsEntry("species", "M_x_c").containsEntry("unblocks", "1").containsEntry("blocks", "2")
                .containsEntry("considered", "5").containsEntry("mappable", "2").containsEntry("blockedReactions", "2");
        Finding generic = m.allFindings().stream().filter(f -> f.ruleId().equals("mapping.generic-species")).findFirst()
                .orElseThrow();
        assertThat(generic.data()).containsEntry("species", "M_acp_c").containsEntry("reasons", "R group in formula")
                .containsEntry("blocks", "2").containsEntry("blockedOnlyByGeneric", "1");
    }
}
