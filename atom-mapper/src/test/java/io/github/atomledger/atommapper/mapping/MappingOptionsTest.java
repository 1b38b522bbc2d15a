package io.github.atomledger.atommapper.mapping;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.Duration;
import org.junit.jupiter.api.Test;

/** Issue 3: defaults, validation and the cache fingerprint of {@link MappingOptions}. */
class MappingOptionsTest {

    @Test
    void defaultsToTwoSecondsAndWeightsThreeOneOne() {
        MappingOptions o = MappingOptions.defaults();
        assertThat(o.timeBudget()).isEqualTo(Duration.ofSeconds(2));
        assertThat(o.bondWeight("C", "C")).isEqualTo(3);
        assertThat(o.bondWeight("C", "O")).isEqualTo(1);
        assertThat(o.bondWeight("P", "O")).isEqualTo(1);
        assertThat(o.orderChangeWeight()).isEqualTo(1);
        assertThat(o.fingerprint()).isEqualTo("t=PT2S;max=400;nodes=max;w=3/1/1;alt=8;conf=PT1S");
        assertThat(o.alternativeCarbonCarbonWeights()).containsExactly(2, 4);
    }

    @Test
    void changesFingerprintWithEverySettingThatChangesResults() {
        MappingOptions o = MappingOptions.defaults();
        assertThat(o.withNodeLimit(1000).fingerprint()).isNotEqualTo(o.fingerprint()).contains("nodes=1000");
        assertThat(o.withMaxHeavyAtoms(50).fingerprint()).contains("max=50");
        assertThat(o.withTimeBudget(Duration.ofMillis(500)).fingerprint()).contains("t=PT0.5S");
        assertThat(new MappingOptions(Duration.ofSeconds(2), 400, Long.MAX_VALUE, 4, 1, 1, 8).fingerprint())
                .contains("w=4/1/1");
        assertThat(o.withConfidenceBudget(Duration.ZERO).fingerprint()).contains("conf=PT0S");
    }

    @Test
    void leavesOutAlternativeWeightsTheOtherWeightsForbid() {
        // Issue 16: an order change may cost at most twice the cheaper break weight, so C-C 1 is out here.
        MappingOptions o = new MappingOptions(Duration.ofSeconds(2), 400, Long.MAX_VALUE, 2, 2, 3, 8);
        assertThat(o.alternativeCarbonCarbonWeights()).containsExactly(3);
        assertThatThrownBy(() -> o.withConfidenceBudget(Duration.ofSeconds(-1)))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("confidenceBudget");
    }

    @Test
    void rejectsSettingsOutOfRange() {
        assertThatThrownBy(() -> MappingOptions.defaults().withTimeBudget(Duration.ZERO))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("timeBudget");
        assertThatThrownBy(() -> new MappingOptions(Duration.ofSeconds(1), 10, 10, 1, 1, 3, 1))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("1/1/3");
        assertThatThrownBy(() -> MappingOptions.defaults().withMaxHeavyAtoms(0))
                .isInstanceOf(IllegalArgumentException.class);
    }
}
