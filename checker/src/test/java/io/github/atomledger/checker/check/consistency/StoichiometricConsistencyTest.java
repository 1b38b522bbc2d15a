package io.github.atomledger.checker.check.consistency;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.formula.Rational;

import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

/** The two-sided exact consistency test (Gevorgyan, Poolman &amp; Fell 2008) on networks written as text. */
class StoichiometricConsistencyTest {

    private static ConsistencyResult analyse(InternalNetwork network) {
        return new StoichiometricConsistency().analyse(network);
    }

    @Test
    void provesABalancedNetworkWithFormulasConsistent() {
        // Glycolysis-like isomerisation and cleavage with water (formulas from memory: glucose C6H12O6,
        // two lactate-like C3H6O3 halves), balanced in every element.
        ConsistencyResult r = analyse(TinyNetworks.of("G=C6H12O6 F=C6H12O6 L=C3H6O3 W=H2O P=C3H4O2",
                "R1: G -> F", "R2: F -> 2 L", "R3: L -> P + W"));
        assertThat(r.unconserved()).isEmpty();
        assertThat(r.verification()).isEqualTo("exact");
    }

    @Test
    void findsProtonsMadeFromNothingByAFractionalProtonCoefficient() {
        // R1 A -> B + 2 H is balanced; R2 B + 1.5 H -> A lacks half a proton, so R1 + R2 makes 0.5 H.
        ConsistencyResult r = analyse(TinyNetworks.of("A=C2H4 B=C2H2 H=H", "R1: A -> B + 2 H", "R2: B + 1.5 H -> A"));
        assertThat(r.unconserved()).containsExactly("H");
        assertThat(r.verification()).isEqualTo("exact");
        assertThat(r.fluxes()).containsOnlyKeys("R1", "R2");
        assertThat(r.fluxes().get("R1")).isEqualTo(r.fluxes().get("R2"));
        assertThat(r.net()).containsOnlyKeys("H");
        assertThat(r.net().get("H")).isEqualTo(r.fluxes().get("R1").multiply(Rational.parse("0.5")));
    }

    @Test
    void provesSpeciesConservableThatTheirWrongFormulasWouldLeaveOut() {
        // B's formula is wrong (C3 for C2), so R1 is carbon-imbalanced and no element weight conserves it,
        // yet masses A = B = 1, C = 2 are conserved: the network is consistent, and it is proven.
        ConsistencyResult r = analyse(TinyNetworks.of("A=C2H4 B=C3H4 C=C4H8", "R1: A -> B", "R2: A + B -> C"));
        assertThat(r.unconserved()).isEmpty();
        assertThat(r.verification()).isEqualTo("exact");
    }

    @Test
    void provesAProtonConservableWhenAnImbalancedNeighbourForcesItsElementWeightToZero() {
        // Hexokinase written without its proton (H short by one) forces the weight of H to zero, so the proton
        // weighs nothing in the element family; the network is still consistent (ATP and ADP can take masses of
        // their own), and that must be proven, not left undetermined. Formulas from memory (pH 7 forms).
        ConsistencyResult r = analyse(TinyNetworks.of(
                "GLC=C6H12O6 ATP=C10H12N5O13P3 G6P=C6H11O9P ADP=C10H12N5O10P2 W=H2O PI=HO4P H=H",
                "HEX: GLC + ATP -> G6P + ADP", "ATPM: ATP + W -> ADP + PI + H"));
        assertThat(r.unconserved()).isEmpty();
        assertThat(r.undetermined()).isEmpty();
        assertThat(r.verification()).isEqualTo("exact");
    }

    @Test
    void givesFormulaLessSpeciesMassesOfTheirOwn() {
        ConsistencyResult r = analyse(TinyNetworks.of("A=C2H4O2 E X", "R1: A + E -> X", "R2: X -> A + E"));
        assertThat(r.unconserved()).isEmpty();
        assertThat(r.verification()).isEqualTo("exact");
    }

    @Test
    void namesEveryUnconservedSpeciesAndAShortLeak() {
        // R3 makes D from nothing outright; R1 + R2 make C; E and F stay conserved.
        ConsistencyResult r = analyse(TinyNetworks.of("A B C D E F", "R1: A -> B", "R2: B -> A + C", "R3: E -> E + D",
                "R4: E -> F"));
        assertThat(r.unconserved()).containsExactly("C", "D");
        assertThat(r.verification()).isEqualTo("exact");
        assertThat(r.causingReactions()).isSubsetOf("R1", "R2", "R3");
        r.net().values().forEach(x -> assertThat(x.signum()).isPositive());
    }

    @Test
    void anExhaustedBudgetIsUndecidedNeverConsistent() {
        // One simplex iteration cannot settle a network whose masses need a real LP (the presolve leaves
        // A + B = C, which masses of one cannot satisfy).
        InternalNetwork n = TinyNetworks.of("A B C D E", "R1: A + B -> C", "R2: C -> 2 D", "R3: 2 D -> A + B", "R4: 0.5 D -> 0.5 E");
        ConsistencyResult r = new StoichiometricConsistency(new Lp.Budget(60_000, 1)).analyse(n);
        assertThat(r.verification()).isEqualTo("undecided");
        assertThat(r.undecided()).isTrue();
    }

    @Test
    void anEmptyNetworkIsTriviallyConsistent() {
        ConsistencyResult r = analyse(new InternalNetwork(java.util.List.of(), java.util.List.of(), java.util.List.of()));
        assertThat(r.consistent()).isTrue();
        assertThat(r.verification()).isEqualTo("exact");
    }

    @Test
    void roundsSolverNumbersToNearbyFractions() {
        assertThat(Lp.nearbyFraction(0.3333333333)).isEqualTo(Rational.of(1, 3));
        assertThat(Lp.nearbyFraction(500.0 / 633)).isEqualTo(Rational.of(500, 633));
        assertThat(Lp.nearbyFraction(-2.5)).isEqualTo(Rational.parse("-5/2"));
        assertThat(Lp.nearbyFraction(1e-12)).isEqualTo(Rational.ZERO);
    }

    static Map<String, Rational> netOf(InternalNetwork n, Map<String, Rational> fluxes) {
        Map<String, Rational> net = new TreeMap<>();
        for (InternalNetwork.Column c : n.columns()) {
            Rational v = fluxes.get(c.reaction());
            if (v != null) {
                c.entries().forEach((i, a) -> net.merge(n.species().get(i), a.multiply(v), Rational::add));
            }
        }
        net.values().removeIf(Rational::isZero);
        return net;
    }
}
