package io.github.atomledger.checker;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Issue #13: misspelt names get the nearest known one. */
class NearestNameTest {

    private static final List<String> PROPERTIES = List.of("atomledger.failOn", "atomledger.failOnSeverity",
            "atomledger.formats", "atomledger.models", "atomledger.threads");

    @Test
    void suggestsTheNearestNameForATypo() {
        assertThat(NearestName.of("atomledger.failOnSeverty", PROPERTIES)).contains("atomledger.failOnSeverity");
        assertThat(NearestName.of("atomledger.model", PROPERTIES)).contains("atomledger.models");
        assertThat(NearestName.of("ATOMLEDGER.THREADS", PROPERTIES)).contains("atomledger.threads");
    }

    @Test
    void suggestsNothingWhenNoNameIsClose() {
        assertThat(NearestName.of("atomledger.colour", PROPERTIES)).isEmpty();
        assertThat(NearestName.hint("zzz", List.of("balance.charge"))).isEmpty();
        assertThat(NearestName.sentence("zzz", List.of("balance.charge"))).isEqualTo(".");
    }

    @Test
    void distanceCountsInsertionsDeletionsAndSubstitutions() {
        assertThat(NearestName.distance("kitten", "sitting")).isEqualTo(3);
        assertThat(NearestName.distance("", "abc")).isEqualTo(3);
        assertThat(NearestName.distance("same", "same")).isZero();
    }
}
