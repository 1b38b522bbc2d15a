package io.github.atomledger.checker.check.consistency;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.SharedData;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.balance.BalanceCalculator;
import io.github.atomledger.checker.model.LoadOptions;
import io.github.atomledger.checker.model.ModelLoader;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.model.Participant;
import io.github.atomledger.checker.model.ReactionInfo;

import java.nio.file.Path;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;

/**
 * The consistency test on the real models in ../shared/data (skipped when the folder is absent).
 *
 * <p>Reference values: the largest-support LP of Gevorgyan, Poolman &amp; Fell 2008 (section 3.2) on the same
 * internal network, solved independently with SciPy 1.17.1 ({@code scipy.optimize.linprog}, HiGHS), a
 * general-purpose solver from the Python package registry, once on 2026-12-02 (the network exported from this
 * project's {@link InternalNetwork}, everything else independent).
 */
class RealModelConsistencyTest {

    private static CheckContext context(String name) {
        Path file = SharedData.require(name);
        ModelView model = new ModelLoader(LoadOptions.defaults()).load(file, name);
        BalanceCalculator calc = new BalanceCalculator();
        var chemistry = calc.chemistry(model);
        return new CheckContext(model, chemistry, calc.balances(model, chemistry));
    }

    /**
     * yeast-GEM 9.0.2 (Lu et al. 2019; Zhang et al. 2024; CC BY 4.0): HiGHS finds 2,746 of 2,786 internal
     * metabolites conservable and these 40 not: H+, H2O, H2O2, O2 and superoxide in their compartments. Chemically
     * plausible: the proton-pumping reactions carry non-integer H+ coefficients (r_0439: 1.266 in, 2.532 out) and
     * are element-imbalanced in H, so protons, and with them water and oxygen species, can be made from nothing.
     */
    @Test
    void yeastGemUnconservedMetabolitesMatchAnIndependentSolver() {
        CheckContext context = context("yeast-GEM.xml.gz");
        ConsistencyResult r = new StoichiometricConsistency().analyse(context);
        TreeSet<String> expected = new TreeSet<>();
        for (String range : new String[] {"0793-0810", "0837-0840", "1275-1279"}) {
            int from = Integer.parseInt(range.substring(0, 4));
            int to = Integer.parseInt(range.substring(5));
            for (int k = from; k <= to; k++) {
                expected.add(String.format("s_%04d", k));
            }
        }
        expected.addAll(java.util.List.of("s_2783", "s_3094", "s_3146", "s_3164", "s_2808", "s_2976", "s_2994", "s_3226",
                "s_3449", "s_3657", "s_2817", "s_3813", "s_3931"));
        assertThat(expected).hasSize(40);
        assertThat(r.metabolites()).isEqualTo(2786);
        assertThat(r.reactions()).isEqualTo(3661);
        assertThat(r.unconserved()).isEqualTo(expected);
        assertThat(r.verification()).isEqualTo("exact");
        assertThat(r.undetermined()).isEmpty();
        // The reported leak, recomputed here from the model's own reactions: it makes only unconserved species.
        Map<String, Rational> net = net(context.model(), r.fluxes());
        assertThat(net).isEqualTo(r.net()).isNotEmpty();
        assertThat(expected).containsAll(net.keySet());
        net.values().forEach(x -> assertThat(x.signum()).isPositive());
    }

    /** BiGG e_coli_core: HiGHS finds all 72 internal metabolites conservable. */
    @Test
    void eColiCoreIsProvenConsistent() {
        ConsistencyResult r = new StoichiometricConsistency().analyse(context("e_coli_core.original.xml"));
        assertThat(r.metabolites()).isEqualTo(72);
        assertThat(r.unconserved()).isEmpty();
        assertThat(r.verification()).isEqualTo("exact");
    }

    /**
     * The planted copy changes ATP's formula only; consistency does not depend on formulas, so the verdict must
     * not change, though the element weights no longer conserve the ATP reactions (their masses are then set free).
     */
    @Test
    void aWrongFormulaDoesNotChangeTheVerdict() {
        ConsistencyResult r = new StoichiometricConsistency().analyse(context("e_coli_core.xml"));
        assertThat(r.unconserved()).isEmpty();
        assertThat(r.verification()).isEqualTo("exact");
    }

    private static Map<String, Rational> net(ModelView model, Map<String, Rational> fluxes) {
        Map<String, Rational> net = new TreeMap<>();
        for (ReactionInfo reaction : model.reactions()) {
            Rational v = fluxes.get(reaction.id());
            if (v == null) {
                continue;
            }
            for (Participant p : reaction.reactants()) {
                net.merge(p.species(), Rational.parse(p.stoichiometryText()).multiply(v).negate(), Rational::add);
            }
            for (Participant p : reaction.products()) {
                net.merge(p.species(), Rational.parse(p.stoichiometryText()).multiply(v), Rational::add);
            }
        }
        net.values().removeIf(Rational::isZero);
        return net;
    }
}
