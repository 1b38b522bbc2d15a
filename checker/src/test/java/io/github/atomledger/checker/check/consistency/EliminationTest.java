package io.github.atomledger.checker.check.consistency;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.formula.Rational;

import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

class EliminationTest {

    private static Map<Integer, Rational> row(Object... pairs) {
        Map<Integer, Rational> row = new TreeMap<>();
        for (int k = 0; k < pairs.length; k += 2) {
            row.put((Integer) pairs[k], Rational.parse((String) pairs[k + 1]));
        }
        return row;
    }

    private static Rational value(Map<Integer, Rational> row, Map<Integer, Rational> x) {
        Rational sum = Rational.ZERO;
        for (Map.Entry<Integer, Rational> e : row.entrySet()) {
            sum = sum.add(e.getValue().multiply(x.getOrDefault(e.getKey(), Rational.ZERO)));
        }
        return sum;
    }

    @Test
    void rewritesAKeptRowOverTheFreeVariable() {
        // x0 = x1 and x1 = 2 x2, so x0 + x2 = 3 x2 with x2 free.
        Elimination e = Elimination.of(List.of(row(0, "1", 1, "-1"), row(1, "1", 2, "-2")), List.of(row(0, "1", 2, "1")));
        assertThat(e.kept()).containsExactly(row(2, "3"));
        assertThat(e.isPivot(2)).isFalse();
        assertThat(e.solve(Map.of(2, Rational.of(5)))).isEqualTo(new TreeMap<>(Map.of(0, Rational.of(10), 1, Rational.of(10),
                2, Rational.of(5))));
    }

    @Test
    void dropsAnEquationThatRepeatsOthers() {
        Elimination e = Elimination.of(List.of(row(0, "1", 1, "-1"), row(1, "1", 2, "-1"), row(0, "2", 2, "-2")), List.of());
        // Two independent equations over three variables: one free variable remains.
        long free = List.of(0, 1, 2).stream().filter(c -> !e.isPivot(c)).count();
        assertThat(free).isEqualTo(1);
    }

    @Test
    void solutionsSatisfyEveryEquationExactlyForAnyFreeValues() {
        Random random = new Random(7);
        for (int trial = 0; trial < 50; trial++) {
            List<Map<Integer, Rational>> equations = new java.util.ArrayList<>();
            for (int r = 0; r < 6; r++) {
                Map<Integer, Rational> row = new TreeMap<>();
                for (int k = 0; k < 3; k++) {
                    row.put(random.nextInt(10), Rational.of(random.nextInt(9) - 4, 1 + random.nextInt(5)));
                }
                row.values().removeIf(Rational::isZero);
                equations.add(row);
            }
            Elimination e = Elimination.of(equations, List.of());
            Map<Integer, Rational> free = new TreeMap<>();
            for (int c = 0; c < 10; c++) {
                free.put(c, Rational.of(random.nextInt(21) - 10, 1 + random.nextInt(3)));
            }
            Map<Integer, Rational> x = e.solve(free);
            for (Map<Integer, Rational> equation : equations) {
                assertThat(value(equation, x)).isEqualTo(Rational.ZERO);
            }
            for (int c = 0; c < 10; c++) {
                if (!e.isPivot(c)) {
                    assertThat(x.getOrDefault(c, Rational.ZERO)).isEqualTo(free.get(c));
                }
            }
        }
    }

    @Test
    void footprintCountsTheVariablesAFreeOneReaches() {
        // Chain x0 = x1, x1 = x2 with x2 free: setting x2 touches all three; x3 is alone.
        Elimination e = Elimination.of(List.of(row(0, "1", 1, "-1"), row(1, "1", 2, "-1")), List.of());
        assertThat(e.footprints(java.util.Set.of(2, 3))).isEqualTo(Map.of(2, 3, 3, 1));
    }
}
