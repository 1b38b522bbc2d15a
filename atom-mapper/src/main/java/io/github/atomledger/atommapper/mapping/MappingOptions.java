package io.github.atomledger.atommapper.mapping;

import java.time.Duration;
import java.util.Objects;

/**
 * Settings of the atom mapper: budgets and bond-edit weights.
 *
 * <p>Weights (see the module README for the reasons): breaking or forming a carbon–carbon bond
 * costs {@code carbonCarbonWeight}; breaking or forming any other heavy-atom bond costs
 * {@code otherBondWeight}; changing the order of a kept bond costs {@code orderChangeWeight}.
 * Defaults 2, 1, 1.
 *
 * @param timeBudget wall-clock budget per reaction (positive); when reached the result is
 *     {@link MappingStatus#BEST_FOUND}
 * @param maxHeavyAtoms cap on heavy atoms per reaction side (copies counted); above it the result is
 *     {@link MappingStatus#TOO_LARGE}
 * @param nodeLimit cap on search nodes per reaction, a deterministic budget (positive; use
 *     {@link Long#MAX_VALUE} for none)
 * @param carbonCarbonWeight cost of breaking or forming a C–C bond (at least 1)
 * @param otherBondWeight cost of breaking or forming any other bond (at least 1)
 * @param orderChangeWeight cost of a bond order change (at least 1, at most the smaller of the other two
 *     weights doubled, so that an order change is never dearer than break plus form)
 * @param maxAlternatives most alternative co-optimal maps listed for an ambiguous result (at least 1)
 */
public record MappingOptions(Duration timeBudget, int maxHeavyAtoms, long nodeLimit, int carbonCarbonWeight,
                             int otherBondWeight, int orderChangeWeight, int maxAlternatives) {

    /** Validates ranges; see the component descriptions. */
    public MappingOptions {
        Objects.requireNonNull(timeBudget, "timeBudget");
        if (timeBudget.isNegative() || timeBudget.isZero()) {
            throw new IllegalArgumentException("timeBudget must be positive, got " + timeBudget);
        }
        if (maxHeavyAtoms < 1 || nodeLimit < 1 || maxAlternatives < 1) {
            throw new IllegalArgumentException("maxHeavyAtoms, nodeLimit and maxAlternatives must be positive");
        }
        if (carbonCarbonWeight < 1 || otherBondWeight < 1 || orderChangeWeight < 1
                || orderChangeWeight > 2 * Math.min(carbonCarbonWeight, otherBondWeight)) {
            throw new IllegalArgumentException("weights must be at least 1 and an order change at most "
                    + "twice the cheaper break weight, got " + carbonCarbonWeight + "/" + otherBondWeight
                    + "/" + orderChangeWeight);
        }
    }

    /** 2 s per reaction, 400 heavy atoms per side, no node cap, weights 2/1/1, 8 alternatives. */
    public static MappingOptions defaults() {
        return new MappingOptions(Duration.ofSeconds(2), 400, Long.MAX_VALUE, 2, 1, 1, 8);
    }

    /** These options with another time budget. */
    public MappingOptions withTimeBudget(Duration budget) {
        return new MappingOptions(budget, maxHeavyAtoms, nodeLimit, carbonCarbonWeight, otherBondWeight,
                orderChangeWeight, maxAlternatives);
    }

    /** These options with another heavy-atom cap. */
    public MappingOptions withMaxHeavyAtoms(int cap) {
        return new MappingOptions(timeBudget, cap, nodeLimit, carbonCarbonWeight, otherBondWeight,
                orderChangeWeight, maxAlternatives);
    }

    /** These options with another node limit. */
    public MappingOptions withNodeLimit(long limit) {
        return new MappingOptions(timeBudget, maxHeavyAtoms, limit, carbonCarbonWeight, otherBondWeight,
                orderChangeWeight, maxAlternatives);
    }

    /** The weight of breaking or forming a bond between two elements. */
    public int bondWeight(String elementA, String elementB) {
        return elementA.equals("C") && elementB.equals("C") ? carbonCarbonWeight : otherBondWeight;
    }

    /**
     * A stable text naming every setting that can change a result, for cache keys together with
     * {@link AtomMapper#VERSION}; e.g. {@code "t=PT2S;max=400;nodes=max;w=2/1/1;alt=8"}.
     */
    public String fingerprint() {
        return "t=" + timeBudget + ";max=" + maxHeavyAtoms + ";nodes="
                + (nodeLimit == Long.MAX_VALUE ? "max" : Long.toString(nodeLimit)) + ";w=" + carbonCarbonWeight
                + "/" + otherBondWeight + "/" + orderChangeWeight + ";alt=" + maxAlternatives;
    }
}
