package io.github.atomledger.checker.baseline;

import io.github.atomledger.checker.check.Finding;

import java.util.Comparator;
import java.util.Objects;

/**
 * One accepted finding of a {@link Baseline}.
 *
 * @param modelFile   the model file relative to the project directory, '/' separated
 * @param ruleId      the rule id of the accepted finding
 * @param elementId   its element id
 * @param fingerprint {@link Fingerprint} of its data
 * @param acceptedBy  who accepted it (free text, no tabs)
 * @param reason      why (free text, no tabs); empty or {@link Baseline#PLACEHOLDER_REASON} means
 *                    not yet given
 * @param line        1-based line in the baseline file, 0 for entries not read from a file
 */
public record BaselineEntry(String modelFile, String ruleId, String elementId, String fingerprint,
                            String acceptedBy, String reason, int line) {

    /** Model file, rule id, element id, fingerprint: the order of the file. */
    public static final Comparator<BaselineEntry> ORDER = Comparator.comparing(BaselineEntry::modelFile)
            .thenComparing(BaselineEntry::ruleId)
            .thenComparing(BaselineEntry::elementId)
            .thenComparing(BaselineEntry::fingerprint);

    public BaselineEntry {
        Objects.requireNonNull(modelFile, "modelFile");
        Objects.requireNonNull(ruleId, "ruleId");
        Objects.requireNonNull(elementId, "elementId");
        Objects.requireNonNull(fingerprint, "fingerprint");
        acceptedBy = oneField(acceptedBy);
        reason = oneField(reason);
    }

    /** A new entry for a finding, with the placeholder reason. */
    public static BaselineEntry pending(Finding f, String acceptedBy) {
        return new BaselineEntry(f.modelFile(), f.ruleId(), f.elementId(), Fingerprint.of(f), acceptedBy,
                Baseline.PLACEHOLDER_REASON, 0);
    }

    /** What matches a finding: file, rule, element and fingerprint. */
    public Key key() {
        return new Key(modelFile, ruleId, elementId, fingerprint);
    }

    /** True when a reason was given (not empty, not the placeholder). */
    public boolean hasReason() {
        return !reason.isBlank() && !reason.strip().startsWith(Baseline.PLACEHOLDER_PREFIX);
    }

    /** The same entry with a line number (0 when written). */
    BaselineEntry atLine(int newLine) {
        return new BaselineEntry(modelFile, ruleId, elementId, fingerprint, acceptedBy, reason, newLine);
    }

    private static String oneField(String text) {
        return text == null ? "" : text.replace('\t', ' ').replace('\r', ' ').replace('\n', ' ').strip();
    }

    /**
     * The matching key of an entry or finding.
     *
     * @param modelFile   model file
     * @param ruleId      rule id
     * @param elementId   element id
     * @param fingerprint data fingerprint
     */
    public record Key(String modelFile, String ruleId, String elementId, String fingerprint) {

        public static Key of(Finding f) {
            return new Key(f.modelFile(), f.ruleId(), f.elementId(), Fingerprint.of(f));
        }
    }
}
