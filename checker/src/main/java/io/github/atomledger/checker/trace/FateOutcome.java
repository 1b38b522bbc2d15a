package io.github.atomledger.checker.trace;

import java.util.Objects;

/**
 * How one declared fate compares with the trace.
 *
 * @param expectation the declared fate
 * @param verdict     holds, differs, undecided, or invalid (the line names something that does not exist)
 * @param carbon      the source carbon's label ("" when the carbon does not exist)
 * @param actual      where the carbon ends, as people read it ("" when unknown)
 * @param step        1-based step where actual and expected part (differs) or the step that left
 *                    the carbon undecided; 0 when none
 * @param stepText    that step as written ({@code -R_X}), "" when none
 * @param detail      one clause: why it is undecided or invalid, or a hint where it differs ("" otherwise)
 */
public record FateOutcome(FateExpectation expectation, Verdict verdict, String carbon, String actual, int step,
                          String stepText, String detail) {

    /** The verdicts (the JSON names are the labels). */
    public enum Verdict {
        HOLDS("holds"), DIFFERS("differs"), UNDECIDED("undecided"), INVALID("invalid");

        private final String label;

        Verdict(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    public FateOutcome {
        Objects.requireNonNull(expectation, "expectation");
        Objects.requireNonNull(verdict, "verdict");
        carbon = carbon == null ? "" : carbon;
        actual = actual == null ? "" : actual;
        stepText = stepText == null ? "" : stepText;
        detail = detail == null ? "" : detail;
    }
}
