package io.github.atomledger.checker.check.consistency;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.formula.Formula;
import io.github.atomledger.atommapper.formula.Rational;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.ojalgo.optimisation.Expression;
import org.ojalgo.optimisation.ExpressionsBasedModel;
import org.ojalgo.optimisation.Optimisation;
import org.ojalgo.optimisation.Variable;

/**
 * Random networks, with and without formulas, against the plain largest-support LP of Gevorgyan, Poolman &amp;
 * Fell 2008 (section 3.2: maximise Σ k subject to Sᵀm = 0, 0 ≤ k ≤ m, k ≤ 1) on the whole network, with no
 * formulas, presolve, compression or elimination: the two must name the same unconserved species, and every
 * leak reported must make exactly what it claims.
 */
class RandomNetworkConsistencyTest {

    @Test
    void agreesWithThePlainLargestSupportLpOnRandomNetworks() {
        Random random = new Random(20261202);
        int inconsistent = 0;
        for (int trial = 0; trial < 300; trial++) {
            InternalNetwork network = randomNetwork(random, trial % 3 != 0);
            ConsistencyResult ours = new StoichiometricConsistency().analyse(network);
            TreeSet<String> reference = plainUnconserved(network);
            assertThat(ours.unconserved()).as("trial %d", trial).isEqualTo(reference);
            assertThat(ours.verification()).as("trial %d", trial).isEqualTo("exact");
            if (!reference.isEmpty()) {
                inconsistent++;
                Map<String, Rational> net = StoichiometricConsistencyTest.netOf(network, ours.fluxes());
                assertThat(net).as("trial %d", trial).isEqualTo(ours.net()).isNotEmpty();
                assertThat(ours.unconserved()).containsAll(net.keySet());
            }
        }
        // Both kinds of network were drawn (181 of 300 inconsistent with this seed).
        assertThat(inconsistent).isBetween(30, 270);
    }

    /**
     * A network of 6-25 species with masses drawn first (formulas C_a H_b), reactions balanced in those masses,
     * a few reactions whose coefficients are perturbed so that some of them leak, and a few formulas off by one
     * hydrogen (imbalanced-looking reactions that conserve mass).
     */
    static InternalNetwork randomNetwork(Random random, boolean withFormulas) {
        int n = 6 + random.nextInt(20);
        List<String> species = new ArrayList<>();
        List<Formula> formulas = new ArrayList<>();
        long[] carbons = new long[n];
        long[] hydrogens = new long[n];
        for (int i = 0; i < n; i++) {
            species.add("S" + i);
            carbons[i] = random.nextInt(4);
            hydrogens[i] = 1 + random.nextInt(6);
            Map<String, Long> counts = new TreeMap<>();
            if (carbons[i] > 0) {
                counts.put("C", carbons[i]);
            }
            counts.put("H", hydrogens[i]);
            if (random.nextInt(6) == 0) {
                // A wrong formula: the reactions of this species look element-imbalanced, the masses do not change.
                counts.merge("H", 1L, Long::sum);
            }
            formulas.add(withFormulas && random.nextInt(5) > 0 ? Formula.of(counts) : null);
        }
        List<InternalNetwork.Column> columns = new ArrayList<>();
        int reactions = 5 + random.nextInt(30);
        for (int r = 0; r < reactions; r++) {
            int a = random.nextInt(n);
            int b = random.nextInt(n);
            int c = random.nextInt(n);
            if (a == b || b == c || a == c) {
                continue;
            }
            // a + b -> q c with q chosen so that C and H balance where possible: use the mass 12 C + H.
            Rational massAB = mass(carbons, hydrogens, a).add(mass(carbons, hydrogens, b));
            Rational q = massAB.divide(mass(carbons, hydrogens, c));
            if (random.nextInt(6) == 0) {
                q = q.add(Rational.of(1 + random.nextInt(3), 4));
            }
            Map<Integer, Rational> entries = new TreeMap<>();
            entries.put(a, Rational.of(-1));
            entries.put(b, Rational.of(-1));
            entries.put(c, q);
            columns.add(new InternalNetwork.Column("R" + r, entries));
        }
        return new InternalNetwork(species, formulas, columns);
    }

    private static Rational mass(long[] carbons, long[] hydrogens, int i) {
        return Rational.of(12 * carbons[i] + hydrogens[i]);
    }

    /** Species no conserved mass vector m ≥ 0 can make positive, by the plain LP in doubles. */
    static TreeSet<String> plainUnconserved(InternalNetwork network) {
        ExpressionsBasedModel lp = new ExpressionsBasedModel();
        int n = network.size();
        Variable[] m = new Variable[n];
        Variable[] k = new Variable[n];
        for (int i = 0; i < n; i++) {
            m[i] = lp.addVariable("m" + i).lower(0);
            k[i] = lp.addVariable("k" + i).lower(0).upper(1).weight(1);
            Expression below = lp.addExpression("k" + i + "<=m" + i).upper(0);
            below.set(k[i], 1);
            below.set(m[i], -1);
        }
        for (InternalNetwork.Column c : network.columns()) {
            Expression conserve = lp.addExpression(c.reaction()).level(0);
            c.entries().forEach((i, a) -> conserve.set(m[i], Lp.toDouble(a)));
        }
        Optimisation.Result result = lp.maximise();
        assertThat(result.getState().isOptimal()).isTrue();
        TreeSet<String> unconserved = new TreeSet<>();
        for (int i = 0; i < n; i++) {
            if (k[i].getValue().doubleValue() < 0.5) {
                unconserved.add(network.species().get(i));
            }
        }
        return unconserved;
    }
}
