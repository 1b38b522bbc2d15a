package io.github.atomledger.maven;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;

/** Issue #13: numeric parameters get clear errors naming the property, the value and what is allowed. */
class ParameterValuesTest {

    @Test
    void threadsAcceptZeroAndPositiveCountsOnly() throws Exception {
        assertThat(ParameterValues.threads("0")).isZero();
        assertThat(ParameterValues.threads(" 4 ")).isEqualTo(4);
        assertThat(ParameterValues.threads(null)).isZero();
        assertThatThrownBy(() -> ParameterValues.threads("-1"))
                .hasMessage("AtomLedger configuration: atomledger.threads='-1' is not valid: a thread count cannot be"
                        + " negative; use 0 for one thread per core, or a positive number.");
        assertThatThrownBy(() -> ParameterValues.threads("four")).hasMessageContaining("atomledger.threads='four'");
    }

    @Test
    void durationsTakeMillisecondsOrAUnit() throws Exception {
        assertThat(ParameterValues.durationMillis("mappingTimeBudget", "2000", 1)).isEqualTo(2000);
        assertThat(ParameterValues.durationMillis("mappingTimeBudget", "2s", 1)).isEqualTo(2000);
        assertThat(ParameterValues.durationMillis("mappingTimeBudget", "1.5s", 1)).isEqualTo(1500);
        assertThat(ParameterValues.durationMillis("mappingTimeBudget", "500 ms", 1)).isEqualTo(500);
        assertThat(ParameterValues.durationMillis("mappingTimeBudget", "1m", 1)).isEqualTo(60_000);
        assertThat(ParameterValues.durationMillis("mappingTimeBudget", "", 2000)).isEqualTo(2000);
        assertThatThrownBy(() -> ParameterValues.durationMillis("mappingTimeBudget", "2h", 1))
                .hasMessage("AtomLedger configuration: atomledger.mappingTimeBudget='2h' is not valid: write milliseconds"
                        + " (2000) or a number with a unit: 500ms, 2s, 1.5s, 1m.");
        assertThatThrownBy(() -> ParameterValues.durationMillis("mappingTimeBudget", "0", 1)).hasMessageContaining("positive");
        assertThatThrownBy(() -> ParameterValues.durationMillis("mappingTimeBudget", "-5", 1)).hasMessageContaining("'-5'");
    }

    @Test
    void sizesTakeBytesOrABinaryUnit() throws Exception {
        assertThat(ParameterValues.bytes("maxModelBytes", "1g", 1)).isEqualTo(1L << 30);
        assertThat(ParameterValues.bytes("maxModelBytes", "512MiB", 1)).isEqualTo(512L << 20);
        assertThat(ParameterValues.bytes("maxModelBytes", "1073741824", 1)).isEqualTo(1L << 30);
        assertThatThrownBy(() -> ParameterValues.bytes("maxModelBytes", "1.5g", 1)).hasMessageContaining("atomledger.maxModelBytes");
        assertThatThrownBy(() -> ParameterValues.bytes("maxModelBytes", "0", 1)).hasMessageContaining("positive");
    }

    @Test
    void positiveCountsRejectZeroAndText() throws Exception {
        assertThat(ParameterValues.positive("maxHeavyAtoms", "400", 400)).isEqualTo(400);
        assertThatThrownBy(() -> ParameterValues.positive("maxHeavyAtoms", "0", 400))
                .hasMessageContaining("atomledger.maxHeavyAtoms='0'");
    }

    @Test
    void confidenceBudgetMayBeZeroAndReviewMarginNotNegative() throws Exception {
        assertThat(ParameterValues.durationOrZeroMillis("mappingConfidenceBudget", "0", 1000)).isZero();
        assertThat(ParameterValues.durationOrZeroMillis("mappingConfidenceBudget", "1s", 1000)).isEqualTo(1000);
        assertThat(ParameterValues.durationOrZeroMillis("mappingConfidenceBudget", null, 1000)).isEqualTo(1000);
        assertThatThrownBy(() -> ParameterValues.durationOrZeroMillis("mappingConfidenceBudget", "-1", 1000))
                .hasMessageContaining("atomledger.mappingConfidenceBudget='-1'");
        assertThat(ParameterValues.nonNegative("reviewMargin", "0", 0)).isZero();
        assertThat(ParameterValues.nonNegative("reviewMargin", " 2 ", 0)).isEqualTo(2);
        assertThatThrownBy(() -> ParameterValues.nonNegative("reviewMargin", "-2", 0))
                .hasMessage("AtomLedger configuration: atomledger.reviewMargin='-2' is not valid: it cannot be negative;"
                        + " use 0 or a positive whole number.");
        assertThatThrownBy(() -> ParameterValues.nonNegative("reviewMargin", "two", 0))
                .hasMessageContaining("atomledger.reviewMargin='two'");
    }
}
