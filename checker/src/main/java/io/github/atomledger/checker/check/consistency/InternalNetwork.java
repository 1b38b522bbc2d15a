package io.github.atomledger.checker.check.consistency;

import io.github.atomledger.atommapper.formula.Formula;
import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.balance.ReactionBalance;
import io.github.atomledger.checker.check.balance.ReactionClass;
import io.github.atomledger.checker.check.balance.SpeciesChemistry;
import io.github.atomledger.checker.model.Participant;
import io.github.atomledger.checker.model.ReactionInfo;
import io.github.atomledger.checker.model.SpeciesInfo;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * The internal network the consistency test works on: the net stoichiometry S of every internal
 * reaction (class internal, transport or ATP maintenance, with usable coefficients) over its
 * non-boundary species, and each species' formula where it has a usable one.
 *
 * <p>Exchange, demand, sink, biomass and other pseudo-reactions are left out: they exchange matter
 * with the outside by design. Species are numbered 0..n-1 in order of first appearance, reactions
 * keep model order, so everything built on this is deterministic.
 *
 * @param species  species ids by index
 * @param formulas usable formula per species index (non-empty, no {@code (...)n} part), else null
 * @param columns  one per internal reaction: its id and non-zero net coefficients by species index
 */
record InternalNetwork(List<String> species, List<Formula> formulas, List<Column> columns) {

    /**
     * The net stoichiometry of one reaction: species index to non-zero coefficient, sorted.
     * {@code species} and {@code whole} repeat the entries with every coefficient multiplied by their
     * common denominator, as whole numbers (the equations Σ c_i m_i = 0 are homogeneous, so the
     * factor changes nothing); {@code whole} is null when they do not fit in a long.
     */
    record Column(String reaction, Map<Integer, Rational> entries, int[] species, long[] whole) {

        Column(String reaction, Map<Integer, Rational> entries) {
            this(reaction, entries, entries.keySet().stream().mapToInt(Integer::intValue).toArray(), whole(entries));
        }

        private static long[] whole(Map<Integer, Rational> entries) {
            long lcd = 1;
            for (Rational c : entries.values()) {
                if (c.denominator().bitLength() > 62 || c.numerator().bitLength() > 62) {
                    return null;
                }
                long d = c.denominator().longValue();
                try {
                    lcd = Math.multiplyExact(lcd / gcd(lcd, d), d);
                } catch (ArithmeticException overflow) {
                    return null;
                }
            }
            long[] out = new long[entries.size()];
            int k = 0;
            for (Rational c : entries.values()) {
                try {
                    out[k++] = Math.multiplyExact(c.numerator().longValue(), lcd / c.denominator().longValue());
                } catch (ArithmeticException overflow) {
                    return null;
                }
            }
            return out;
        }

        private static long gcd(long a, long b) {
            while (b != 0) {
                long t = a % b;
                a = b;
                b = t;
            }
            return a;
        }
    }

    InternalNetwork {
        species = List.copyOf(species);
        formulas = java.util.Collections.unmodifiableList(new ArrayList<>(formulas));
        columns = List.copyOf(columns);
    }

    static InternalNetwork of(CheckContext context) {
        Map<String, Integer> index = new LinkedHashMap<>();
        List<Column> columns = new ArrayList<>();
        for (ReactionInfo r : context.model().reactions()) {
            ReactionBalance b = context.balance(r.id());
            if (!isInternal(b.reactionClass()) || !b.missingSpecies().isEmpty() || !b.badCoefficients().isEmpty()) {
                continue;
            }
            Map<String, Rational> net = new TreeMap<>();
            for (Participant p : r.reactants()) {
                net.merge(p.species(), Rational.parse(p.stoichiometryText()).negate(), Rational::add);
            }
            for (Participant p : r.products()) {
                net.merge(p.species(), Rational.parse(p.stoichiometryText()), Rational::add);
            }
            Map<Integer, Rational> entries = new TreeMap<>();
            net.forEach((id, c) -> {
                boolean boundary = context.model().species(id).map(SpeciesInfo::boundary).orElse(true);
                if (!c.isZero() && !boundary) {
                    entries.put(index.computeIfAbsent(id, k -> index.size()), c);
                }
            });
            if (!entries.isEmpty()) {
                columns.add(new Column(r.id(), entries));
            }
        }
        List<String> species = new ArrayList<>(index.keySet());
        List<Formula> formulas = new ArrayList<>();
        for (String id : species) {
            Formula f = context.chemistry(id).map(SpeciesChemistry::formula).orElse(null);
            formulas.add(f == null || f.isPolymer() || f.counts().isEmpty() ? null : f);
        }
        return new InternalNetwork(species, formulas, columns);
    }

    /** True when {@code masses} (species index to mass, absent = 0) is conserved by every reaction. */
    boolean conserves(Map<Integer, Rational> masses) {
        long[] scaled = scaled(masses);
        for (Column c : columns) {
            // Σ c_i m_i = 0 exactly iff the same sum over whole coefficients and the masses times their
            // common denominator is 0: long arithmetic when everything fits, rationals otherwise.
            Boolean zero = scaled == null || c.whole() == null ? null : wholeSumIsZero(c, scaled);
            if (zero == null) {
                Rational sum = Rational.ZERO;
                for (Map.Entry<Integer, Rational> e : c.entries().entrySet()) {
                    Rational m = masses.get(e.getKey());
                    if (m != null) {
                        sum = sum.add(e.getValue().multiply(m));
                    }
                }
                zero = sum.isZero();
            }
            if (!zero) {
                return false;
            }
        }
        return true;
    }

    /** Masses times their common denominator, as longs; null when they do not fit. */
    private long[] scaled(Map<Integer, Rational> masses) {
        java.math.BigInteger lcd = java.math.BigInteger.ONE;
        for (Rational m : masses.values()) {
            java.math.BigInteger d = m.denominator();
            if (!d.equals(lcd) && !d.equals(java.math.BigInteger.ONE)) {
                lcd = lcd.divide(lcd.gcd(d)).multiply(d);
                if (lcd.bitLength() > 62) {
                    return null;
                }
            }
        }
        long[] out = new long[species.size()];
        for (Map.Entry<Integer, Rational> e : masses.entrySet()) {
            java.math.BigInteger v = e.getValue().numerator().multiply(lcd.divide(e.getValue().denominator()));
            if (v.bitLength() > 62) {
                return null;
            }
            out[e.getKey()] = v.longValue();
        }
        return out;
    }

    /** Whether Σ whole_i m_i is zero; null when a step overflows. */
    private static Boolean wholeSumIsZero(Column c, long[] masses) {
        long sum = 0;
        try {
            for (int k = 0; k < c.species().length; k++) {
                sum = Math.addExact(sum, Math.multiplyExact(c.whole()[k], masses[c.species()[k]]));
            }
        } catch (ArithmeticException overflow) {
            return null;
        }
        return sum == 0;
    }

    static boolean isInternal(ReactionClass c) {
        return c == ReactionClass.INTERNAL || c == ReactionClass.TRANSPORT || c == ReactionClass.ATP_MAINTENANCE;
    }

    int size() {
        return species.size();
    }

    /**
     * Σ<sub>r</sub> flux<sub>r</sub> · S<sub>r</sub>: the net production of each species by a
     * combination of reactions (column index to coefficient); non-zero entries only.
     */
    TreeMap<Integer, Rational> net(Map<Integer, Rational> fluxes) {
        TreeMap<Integer, Rational> net = new TreeMap<>();
        fluxes.forEach((j, v) -> columns.get(j).entries().forEach((i, c) -> net.merge(i, c.multiply(v), Rational::add)));
        net.values().removeIf(Rational::isZero);
        return net;
    }
}
