package io.github.atomledger.checker.check.consistency;

import io.github.atomledger.atommapper.formula.Rational;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.ojalgo.optimisation.Expression;
import org.ojalgo.optimisation.ExpressionsBasedModel;
import org.ojalgo.optimisation.Optimisation;
import org.ojalgo.optimisation.Variable;

/**
 * A linear program in doubles, solved by ojAlgo's simplex within a wall-clock budget. The answer
 * is only a guide: every conclusion drawn from it is re-checked in exact arithmetic by the caller.
 * Not thread-safe; one instance per solve.
 */
final class Lp {

    /** The outcome: {@code values} is null unless {@link #solved()}. */
    record Solution(Optimisation.State state, double[] values) {

        /** An optimal solution was found. */
        boolean solved() {
            return values != null;
        }

        /** The solver proved that no solution exists. */
        boolean infeasible() {
            return state == Optimisation.State.INFEASIBLE;
        }
    }

    private final ExpressionsBasedModel model = new ExpressionsBasedModel();
    private final List<Variable> variables = new ArrayList<>();

    /**
     * How long one solve may take: wall-clock milliseconds, and simplex iterations (a limit that
     * does not depend on the machine, for tests; 0 means ojAlgo's default).
     */
    record Budget(long millis, int iterations) {

        static final Budget DEFAULT = new Budget(StoichiometricConsistency.LP_TIME_BUDGET_MS, 0);
    }

    Lp(Budget budget) {
        model.options.time_abort = budget.millis();
        if (budget.iterations() > 0) {
            model.options.iterations_abort = budget.iterations();
        }
    }

    /** Adds a variable with {@code lower ≤ x ≤ upper} (upper null: unbounded) and objective weight; returns its index. */
    int variable(double lower, Double upper, double weight) {
        Variable v = model.addVariable("x" + variables.size()).lower(lower).weight(weight);
        if (upper != null) {
            v.upper(upper);
        }
        variables.add(v);
        return variables.size() - 1;
    }

    /** Adds {@code lower ≤ Σ a_j x_j ≤ upper}; a null bound is absent. */
    void row(Map<Integer, Double> coefficients, Double lower, Double upper) {
        Expression e = model.addExpression("r" + model.countExpressions());
        coefficients.forEach((j, a) -> e.set(variables.get(j), a));
        if (lower != null) {
            e.lower(lower);
        }
        if (upper != null) {
            e.upper(upper);
        }
    }

    Solution maximise() {
        return solution(model.maximise());
    }

    Solution minimise() {
        return solution(model.minimise());
    }

    private Solution solution(Optimisation.Result result) {
        if (result.getState() != Optimisation.State.OPTIMAL && result.getState() != Optimisation.State.DISTINCT) {
            return new Solution(result.getState(), null);
        }
        double[] values = new double[variables.size()];
        for (int j = 0; j < values.length; j++) {
            values[j] = variables.get(j).getValue().doubleValue();
        }
        return new Solution(result.getState(), values);
    }

    static double toDouble(Rational r) {
        if (r.numerator().bitLength() <= 53 && r.denominator().bitLength() <= 53) {
            // Both exact as doubles, so one division rounds the quotient correctly.
            return r.numerator().doubleValue() / r.denominator().doubleValue();
        }
        return new BigDecimal(r.numerator()).divide(new BigDecimal(r.denominator()), MathContext.DECIMAL64).doubleValue();
    }

    /** The simplest fraction within 1e-9 (relative) of x, by continued fractions; zero for non-finite x. */
    static Rational nearbyFraction(double x) {
        if (x == 0 || Double.isNaN(x) || Double.isInfinite(x)) {
            return Rational.ZERO;
        }
        double tolerance = Math.max(1e-9, Math.abs(x) * 1e-9);
        java.math.BigInteger h0 = java.math.BigInteger.ZERO;
        java.math.BigInteger h1 = java.math.BigInteger.ONE;
        java.math.BigInteger k0 = java.math.BigInteger.ONE;
        java.math.BigInteger k1 = java.math.BigInteger.ZERO;
        double rest = Math.abs(x);
        for (int step = 0; step < 40; step++) {
            double a = Math.floor(rest);
            java.math.BigInteger ai = BigDecimal.valueOf(a).toBigInteger();
            java.math.BigInteger h2 = ai.multiply(h1).add(h0);
            java.math.BigInteger k2 = ai.multiply(k1).add(k0);
            h0 = h1;
            h1 = h2;
            k0 = k1;
            k1 = k2;
            if (Math.abs(h1.doubleValue() / k1.doubleValue() - Math.abs(x)) <= tolerance || rest - a < 1e-15) {
                break;
            }
            rest = 1 / (rest - a);
        }
        Rational r = Rational.of(h1, k1);
        return x < 0 ? r.negate() : r;
    }
}
