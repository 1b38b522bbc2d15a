package io.github.atomledger.atommapper.mapping;

import java.time.Duration;
import java.util.Objects;

/**
 * Settings of the atom mapper: budgets and bond-edit weights.
 *
 * <p>Weights (see the module README for the reasons): breaking or forming a carbon–carbon bond
 * costs {@code carbonCarbonWeight}; breaking or forming any other heavy-atom bond costs
 * {@code otherBondWeight}; changing the order of a kept bond costs {@code orderChangeWeight}.
 * Defaults 3, 1, 1.
 *
 * @param timeBudget computing budget per reaction (positive), counted in CPU time of the mapping
 *     thread where the JVM supports it (wall time otherwise); when reached the result is
 *     {@link MappingStatus#BEST_FOUND}
 * @param maxHeavyAtoms cap on heavy atoms per reaction side (copies counted, at most 20000); above it the result is
 *     {@link MappingStatus#TOO_LARGE}
 * @param nodeLimit cap on search nodes per reaction, a deterministic budget (positive; use
 *     {@link Long#MAX_VALUE} for none)
 * @param carbonCarbonWeight cost of breaking or forming a C–C bond (at least 1)
 * @param otherBondWeight cost of breaking or forming any other bond (at least 1)
 * @param orderChangeWeight cost of a bond order change (at least 1, at most the smaller of the other two
 *     weights doubled, so that an order change is never dearer than break plus form)
 * @param maxAlternatives most alternative co-optimal maps listed for an ambiguous result (at least 1)
 * @param confidenceBudget computing budget per reaction for the confidence analysis of a proven
 *     optimal map ({@link MapConfidence}: the runner-up search and the alternative weightings),
 *     on the same clock as {@code timeBudget}; zero switches the analysis off
 */
public record MappingOptions(Duration timeBudget, int maxHeavyAtoms, long nodeLimit, int carbonCarbonWeight,
                             int otherBondWeight, int orderChangeWeight, int maxAlternatives,
                             Duration confidenceBudget) {

    /** The default confidence budget: 1 s per reaction. */
    public static final Duration DEFAULT_CONFIDENCE_BUDGET = Duration.ofSeconds(1);

    /** Validates ranges; see the component descriptions. */
    public MappingOptions {
        Objects.requireNonNull(timeBudget, "timeBudget");
        Objects.requireNonNull(confidenceBudget, "confidenceBudget");
        if (confidenceBudget.isNegative()) {
            throw new IllegalArgumentException("confidenceBudget must not be negative, got " + confidenceBudget);
        }
        if (timeBudget.isNegative() || timeBudget.isZero()) {
            throw new IllegalArgumentException("timeBudget must be positive, got " + timeBudget);
        }
        if (maxHeavyAtoms < 1 || maxHeavyAtoms > 20_000 || nodeLimit < 1 || maxAlternatives < 1) {
            throw new IllegalArgumentException("maxHeavyAtoms (1..20000), nodeLimit and maxAlternatives must be positive");
        }
        if (carbonCarbonWeight < 1 || otherBondWeight < 1 || orderChangeWeight < 1
                || orderChangeWeight > 2 * Math.min(carbonCarbonWeight, otherBondWeight)) {
            throw new IllegalArgumentException("weights must be at least 1 and an order change at most "
                    + "twice the cheaper break weight, got " + carbonCarbonWeight + "/" + otherBondWeight
                    + "/" + orderChangeWeight);
        }
    }

    /** Options with the default confidence budget; see the component descriptions. */
    public MappingOptions(Duration timeBudget, int maxHeavyAtoms, long nodeLimit, int carbonCarbonWeight,
                          int otherBondWeight, int orderChangeWeight, int maxAlternatives) {
        this(timeBudget, maxHeavyAtoms, nodeLimit, carbonCarbonWeight, otherBondWeight, orderChangeWeight,
                maxAlternatives, DEFAULT_CONFIDENCE_BUDGET);
    }

    /**
     * 2 s per reaction, 400 heavy atoms per side, no node cap, weights 3/1/1, 8 alternatives, 1 s
     * for the confidence analysis.
     */
    public static MappingOptions defaults() {
        return new MappingOptions(Duration.ofSeconds(2), 400, Long.MAX_VALUE, 3, 1, 1, 8, DEFAULT_CONFIDENCE_BUDGET);
    }

    /** These options with another time budget. */
    public MappingOptions withTimeBudget(Duration budget) {
        return new MappingOptions(budget, maxHeavyAtoms, nodeLimit, carbonCarbonWeight, otherBondWeight,
                orderChangeWeight, maxAlternatives, confidenceBudget);
    }

    /** These options with another heavy-atom cap. */
    public MappingOptions withMaxHeavyAtoms(int cap) {
        return new MappingOptions(timeBudget, cap, nodeLimit, carbonCarbonWeight, otherBondWeight,
                orderChangeWeight, maxAlternatives, confidenceBudget);
    }

    /** These options with another node limit (it also caps each search of the confidence analysis). */
    public MappingOptions withNodeLimit(long limit) {
        return new MappingOptions(timeBudget, maxHeavyAtoms, limit, carbonCarbonWeight, otherBondWeight,
                orderChangeWeight, maxAlternatives, confidenceBudget);
    }

    /** These options with another confidence budget; {@link Duration#ZERO} switches the analysis off. */
    public MappingOptions withConfidenceBudget(Duration budget) {
        return new MappingOptions(timeBudget, maxHeavyAtoms, nodeLimit, carbonCarbonWeight, otherBondWeight,
                orderChangeWeight, maxAlternatives, budget);
    }

    /** These options with another C–C weight (the alternative weightings of the confidence analysis). */
    public MappingOptions withCarbonCarbonWeight(int weight) {
        return new MappingOptions(timeBudget, maxHeavyAtoms, nodeLimit, weight, otherBondWeight,
                orderChangeWeight, maxAlternatives, confidenceBudget);
    }

    /**
     * The alternative C–C weights the confidence analysis maps again with: one lower and one
     * higher than {@link #carbonCarbonWeight()}, leaving out any the other weights do not allow
     * (for the defaults: 2 and 4).
     */
    public java.util.List<Integer> alternativeCarbonCarbonWeights() {
        java.util.List<Integer> out = new java.util.ArrayList<>();
        for (int w : new int[] {carbonCarbonWeight - 1, carbonCarbonWeight + 1}) {
            if (w >= 1 && orderChangeWeight <= 2 * Math.min(w, otherBondWeight)) {
                out.add(w);
            }
        }
        return out;
    }

    /** The weight of breaking or forming a bond between two elements. */
    public int bondWeight(String elementA, String elementB) {
        return elementA.equals("C") && elementB.equals("C") ? carbonCarbonWeight : otherBondWeight;
    }

    /**
     * A stable text naming every setting that can change a result, for cache keys together with
     * {@link AtomMapper#VERSION}; e.g. {@code "t=PT2S;max=400;nodes=max;w=3/1/1;alt=8;conf=PT1S"}.
     */
    public String fingerprint() {
        return "t=" + timeBudget + ";max=" + maxHeavyAtoms + ";nodes="
                + (nodeLimit == Long.MAX_VALUE ? "max" : Long.toString(nodeLimit)) + ";w=" + carbonCarbonWeight
                + "/" + otherBondWeight + "/" + orderChangeWeight + ";alt=" + maxAlternatives
                + ";conf=" + confidenceBudget;
    }
}
