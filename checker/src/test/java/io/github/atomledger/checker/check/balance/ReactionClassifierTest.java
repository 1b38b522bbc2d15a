package io.github.atomledger.checker.check.balance;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.TestModels;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.model.ReactionInfo;

import java.util.LinkedHashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** Reaction classes from SBO terms (SBO OBO file, terms listed in METHODS.md section 2) and from structure. */
class ReactionClassifierTest {

    private static Map<String, Classification> classify(String fixture) {
        ModelView m = TestModels.load(fixture);
        Map<String, Classification> out = new LinkedHashMap<>();
        for (ReactionInfo r : m.reactions()) {
            out.put(r.id(), new ReactionClassifier().classify(m, r));
        }
        return out;
    }

    @Test
    void takesTheClassFromTheSboTermWhenItIsSpecific() {
        Map<String, Classification> c = classify("balance/classes.xml");
        assertThat(c.get("EX_glc_e").reactionClass()).isEqualTo(ReactionClass.EXCHANGE);
        assertThat(c.get("EX_glc_e").source()).isEqualTo("sbo");
        assertThat(c.get("BIOMASS").reactionClass()).isEqualTo(ReactionClass.BIOMASS);
        assertThat(c.get("ATPM").reactionClass()).isEqualTo(ReactionClass.ATP_MAINTENANCE);
    }

    @Test
    void fallsBackToStructureWithoutAnSboTerm() {
        Map<String, Classification> c = classify("balance/classes.xml");
        assertThat(c.get("DM_atp_c").reactionClass()).isEqualTo(ReactionClass.DEMAND);
        assertThat(c.get("SK_h2o_c").reactionClass()).isEqualTo(ReactionClass.SINK);
        assertThat(c.get("GLCt").reactionClass()).isEqualTo(ReactionClass.TRANSPORT);
        assertThat(c.get("GLCt").source()).isEqualTo("structure");
        assertThat(c.get("EX_glc_e").fromStructure()).isEqualTo(ReactionClass.EXCHANGE);
    }

    @Test
    void keepsBothClassesWhenSboAndStructureDisagree() {
        Map<String, Classification> c = classify("balance/classes.xml");
        assertThat(c.get("BADEX").fromSbo()).isEqualTo(ReactionClass.EXCHANGE);
        assertThat(c.get("BADEX").fromStructure()).isEqualTo(ReactionClass.INTERNAL);
        assertThat(c.get("BADEX").reactionClass()).isEqualTo(ReactionClass.EXCHANGE);
    }

    @Test
    void reportsSboStructureDisagreements() {
        assertThat(TestModels.findings("balance/classes.xml", "balance.class-mismatch"))
                .extracting(Finding::elementId, f -> f.data().get("sboClass"), f -> f.data().get("structureClass"), Finding::severity)
                .containsExactly(
                        org.assertj.core.groups.Tuple.tuple("BADEX", "exchange", "internal", Severity.WARNING),
                        org.assertj.core.groups.Tuple.tuple("BADTRANS", "transport", "internal", Severity.WARNING));
    }

    @Test
    void reportsExemptOneSidedReactionsAtInfo() {
        assertThat(TestModels.findings("balance/classes.xml", "balance.exempt"))
                .extracting(Finding::elementId).containsExactly("EX_glc_e", "DM_atp_c", "SK_h2o_c", "BADEX");
        assertThat(TestModels.findings("balance/classes.xml", "balance.exempt"))
                .allSatisfy(f -> assertThat(f.severity()).isEqualTo(Severity.INFO));
    }
}
