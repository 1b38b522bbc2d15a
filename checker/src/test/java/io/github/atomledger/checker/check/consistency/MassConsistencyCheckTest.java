package io.github.atomledger.checker.check.consistency;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.TestModels;
import io.github.atomledger.checker.check.Severity;

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
    void roundsSolverNumbersToNearbyFractions() {
        assertThat(Lp.nearbyFraction(0.3333333333)).isEqualTo(Rational.of(1, 3));
        assertThat(Lp.nearbyFraction(500.0 / 633)).isEqualTo(Rational.of(500, 633));
        assertThat(Lp.nearbyFraction(-2.5)).isEqualTo(Rational.parse("-5/2"));
        assertThat(Lp.nearbyFraction(1e-12)).isEqualTo(Rational.ZERO);
    }
}
