package io.github.atomledger.checker;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.formula.Rational;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Issue #13: grammar and plurals in every message and report. */
class WordingTest {

    @Test
    void countsUseTheSingularForOneAndThePluralOtherwise() {
        assertThat(Wording.count(1, "warning")).isEqualTo("1 warning");
        assertThat(Wording.count(0, "error")).isEqualTo("0 errors");
        assertThat(Wording.count(3, "species")).isEqualTo("3 species");
        assertThat(Wording.count(2, "entry")).isEqualTo("2 entries");
        assertThat(Wording.count(2, "weighted bond edit")).isEqualTo("2 weighted bond edits");
        assertThat(Wording.count(5, "info")).isEqualTo("5 info");
        assertThat(Wording.count(2, "match")).isEqualTo("2 matches");
    }

    @Test
    void articleFollowsTheFirstSound() {
        assertThat(Wording.withArticle("exchange reaction")).isEqualTo("an exchange reaction");
        assertThat(Wording.withArticle("internal reaction")).isEqualTo("an internal reaction");
        assertThat(Wording.withArticle("biomass reaction")).isEqualTo("a biomass reaction");
        assertThat(Wording.withArticle("sink reaction")).isEqualTo("a sink reaction");
        assertThat(Wording.withArticle("unit")).isEqualTo("a unit");
    }

    @Test
    void imbalancesAreSaidInWords() {
        assertThat(Wording.elementDelta("O", Rational.ONE)).isEqualTo("O +1: the products have one oxygen more");
        assertThat(Wording.elementDelta("C", Rational.of(-20))).isEqualTo("C -20: the products have 20 carbons fewer");
        assertThat(Wording.elementDelta("H", Rational.parse("-0.633")))
                .isEqualTo("H -0.633: the products have 0.633 hydrogens fewer");
        assertThat(Wording.elementDelta("Xy", Rational.of(2))).isEqualTo("Xy +2: the products have two atoms of Xy more");
        assertThat(Wording.chargeDelta(Rational.of(4))).isEqualTo("charge +4: the products' total charge is four higher");
        assertThat(Wording.chargeDelta(Rational.of(1, 3))).isEqualTo("charge +1/3: the products' total charge is 1/3 higher");
    }

    @Test
    void shortListsSayHowManyAreLeftOut() {
        assertThat(Wording.shortList(List.of("a", "b", "c"), 5)).isEqualTo("a, b and c");
        assertThat(Wording.shortList(List.of("a", "b", "c", "d"), 2)).isEqualTo("a, b and 2 more");
        assertThat(Wording.shortList(List.of("a"), 2)).isEqualTo("a");
    }
}
