package io.github.atomledger.checker.diff;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.SharedData;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.SeverityPolicy;
import io.github.atomledger.checker.model.LoadOptions;
import io.github.atomledger.checker.model.ModelLoader;
import io.github.atomledger.checker.model.ReactionInfo;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/**
 * The release diff on a real model history: BiGG's e_coli_core as first committed
 * ({@code e_coli_core.original.xml}) and after a commit that changed only ATP's formula from
 * C10H12N5O13P3 to C30H12N5O13P3 ({@code e_coli_core.xml}); see ../shared/data/e_coli_core.SOURCE.md,
 * which records 13 two-sided reactions carbon-imbalanced at HEAD: 12 by C ±20 plus the biomass
 * reaction, which was imbalanced before too.
 */
class EcoliCoreReleaseDiffTest {

    private static ModelResult checked(Path file) {
        return new Engine().check(new ModelLoader(new LoadOptions(LoadOptions.DEFAULT_MAX_BYTES)).load(file, "models/e_coli_core.xml"),
                SeverityPolicy.defaults());
    }

    @Test
    void theAtpFormulaChangeIsTwelveRegressionsAndAChangedBiomassImbalance() {
        ModelResult before = checked(SharedData.require("e_coli_core.original.xml"));
        ModelResult after = checked(SharedData.require("e_coli_core.xml"));
        List<Finding> found = ReleaseDiff.compare(before, after, Map.of(), Map.of());

        Set<String> withAtp = after.model().reactions().stream().filter(r -> !r.isOneSided())
                .filter(r -> r.participants().stream().anyMatch(p -> p.species().equals("M_atp_c")))
                .map(ReactionInfo::id).collect(Collectors.toSet());
        List<Finding> regressions = found.stream().filter(f -> f.ruleId().equals(ReleaseDiff.REGRESSION)).toList();
        assertThat(regressions).hasSize(12);
        assertThat(regressions).allSatisfy(f -> {
            assertThat(withAtp).contains(f.elementId());
            assertThat(f.data().get("delta.C")).isIn("20", "-20");
            assertThat(f.data()).containsEntry("was.elements", "balanced").containsEntry("now.elements", "imbalanced")
                    .containsEntry("was.charge", "unknown").containsEntry("now.charge", "unknown");
        });
        List<Finding> changed = found.stream().filter(f -> f.ruleId().equals(ReleaseDiff.CHANGED)).toList();
        assertThat(changed).singleElement().satisfies(f -> {
            assertThat(f.elementId()).isEqualTo("R_Biomass_Ecoli_core_w_GAM");
            assertThat(f.data()).containsEntry("class", "biomass");
        });
        assertThat(found).hasSize(13);
    }

    @Test
    void theOriginalAgainstItselfHasNoFindings() {
        Path original = SharedData.require("e_coli_core.original.xml");
        assertThat(ReleaseDiff.compare(checked(original), checked(original), Map.of(), Map.of())).isEmpty();
    }
}
