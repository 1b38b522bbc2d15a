package io.github.atomledger.checker.check.consistency;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.TestModels;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.balance.BalanceCalculator;
import io.github.atomledger.checker.model.ModelView;

import org.junit.jupiter.api.Test;

/** Stoichiometric consistency (Gevorgyan, Poolman &amp; Fell 2008, Bioinformatics 24:2245) on tiny networks. */
class MassConsistencyCheckTest {

    @Test
    void findsTheMetaboliteMadeFromNothingAndTheReactionsThatMakeIt() {
        assertThat(TestModels.findings("consistency/leak.xml", "balance.mass-inconsistent")).singleElement().satisfies(f -> {
            assertThat(f.elementId()).isEqualTo("leak");
            assertThat(f.severity()).isEqualTo(Severity.ERROR);
            assertThat(f.data()).containsEntry("unconserved", "M_C_c").containsEntry("unconservedCount", "1")
                    .containsEntry("causingReactions", "R1,R2").containsEntry("fluxes", "R1=1,R2=1")
                    .containsEntry("net", "M_C_c=1").containsEntry("verification", "exact")
                    .containsEntry("metabolites", "6").containsEntry("reactions", "4");
        });
    }

    @Test
    void acceptsAConsistentNetworkWithoutFormulas() {
        assertThat(TestModels.findings("consistency/consistent.xml", "balance.mass-inconsistent")).isEmpty();
    }

    @Test
    void catchesAFractionalProtonLoop() {
        assertThat(TestModels.findings("consistency/fractional-proton.xml", "balance.mass-inconsistent")).singleElement()
                .satisfies(f -> {
                    assertThat(f.data()).containsEntry("unconserved", "M_H_c").containsEntry("causingReactions", "R1,R2")
                            .containsEntry("verification", "exact");
                    // R1 + R2 nets 1.133 H; the combination is scaled so that the net is positive.
                    assertThat(f.data().get("net")).startsWith("M_H_c=");
                });
    }

    @Test
    void reportsAnExhaustedBudgetAsUndecidedAndNotAsInconsistent() {
        ModelView model = TestModels.load("consistency/consistent.xml");
        BalanceCalculator calc = new BalanceCalculator();
        var chemistry = calc.chemistry(model);
        CheckContext context = new CheckContext(model, chemistry, calc.balances(model, chemistry));
        StoichiometricConsistency oneIteration = new StoichiometricConsistency(new Lp.Budget(60_000, 1));
        assertThat(new MassConsistencyCheck(false, oneIteration).check(context)).isEmpty();
        assertThat(new MassConsistencyCheck(true, oneIteration).check(context)).singleElement().satisfies(f -> {
            assertThat(f.ruleId()).isEqualTo("balance.consistency-undecided");
            assertThat(f.severity()).isEqualTo(Severity.WARNING);
            assertThat(f.elementId()).isEqualTo("consistent");
            assertThat(f.data()).containsEntry("metabolites", "5");
        });
    }

    @Test
    void aDecidedNetworkHasNoUndecidedFinding() {
        assertThat(TestModels.findings("consistency/leak.xml", "balance.consistency-undecided")).isEmpty();
    }
}
