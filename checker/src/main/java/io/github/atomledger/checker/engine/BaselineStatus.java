package io.github.atomledger.checker.engine;

import java.util.Locale;

/**
 * Where a finding stands against the committed baseline of accepted findings. Reports show it
 * per finding; only {@link #ACCEPTED} keeps a finding from failing the build.
 */
public enum BaselineStatus {
    /** Listed in the baseline with a reason: reported, never fails. */
    ACCEPTED,
    /** Listed in the baseline, but its reason is empty or still the placeholder: fails like a new finding. */
    PENDING_REASON,
    /** Not in the baseline. */
    NEW;

    /** The label used in reports: "accepted", "pending-reason", "new". */
    public String label() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }
}
