package io.github.atomledger.checker.check.balance;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;

/**
 * What kind of reaction a reaction is, for balance purposes. The label is the machine name used
 * in reports and configuration.
 */
public enum ReactionClass {
    /** An ordinary reaction inside one compartment: must balance. */
    INTERNAL("internal", true),
    /** Moves a species between compartments: must balance (element balance is compartment-free). */
    TRANSPORT("transport", true),
    /** ATP maintenance (SBO:0000630): a real hydrolysis, so it must balance. */
    ATP_MAINTENANCE("atp-maintenance", true),
    /** Exchange with the environment (SBO:0000627), one side empty: not balanceable. */
    EXCHANGE("exchange", false),
    /** Demand (SBO:0000628): irreversible drain of an internal species. */
    DEMAND("demand", false),
    /** Sink (SBO:0000632): reversible supply or drain of an internal species. */
    SINK("sink", false),
    /** Biomass production (SBO:0000629) or a lumping reaction: reported, not failed. */
    BIOMASS("biomass", true),
    /** Another pseudoreaction (SBO:0000631): reported, not failed. */
    PSEUDO("pseudo", true);

    private final String label;
    private final boolean balanceComputed;

    ReactionClass(String label, boolean balanceComputed) {
        this.label = label;
        this.balanceComputed = balanceComputed;
    }

    public String label() {
        return label;
    }

    /** False for one-sided classes, whose element vector says nothing about the model's chemistry. */
    public boolean balanceComputed() {
        return balanceComputed;
    }

    /** True for classes whose imbalance is expected by construction and reported, not failed. */
    public boolean isPseudo() {
        return this == BIOMASS || this == PSEUDO;
    }

    /** Parses a label ("biomass"); the error lists the allowed labels. */
    public static ReactionClass parse(String text) {
        for (ReactionClass c : values()) {
            if (c.label.equals(text == null ? "" : text.strip().toLowerCase(Locale.ROOT))) {
                return c;
            }
        }
        throw new IllegalArgumentException("unknown reaction class '" + text + "'; allowed: "
                + Arrays.stream(values()).map(ReactionClass::label).collect(Collectors.joining(", ")));
    }
}
