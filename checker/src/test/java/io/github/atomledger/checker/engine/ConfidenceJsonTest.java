package io.github.atomledger.checker.engine;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.atommapper.mapping.MapConfidence;
import io.github.atomledger.atommapper.mapping.Rearrangement;
import io.github.atomledger.atommapper.mapping.WeightCheck;
import io.github.atomledger.checker.check.mapping.MapStatus;
import io.github.atomledger.checker.check.mapping.ReactionMapping;

import com.fasterxml.jackson.databind.node.NullNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

/** Issue 16: the confidence analysis survives the mapping cache, and old entries read as "not computed". */
class ConfidenceJsonTest {

    private static final AtomTransition T = new AtomTransition(new AtomRef("a", 1, 2), new AtomRef("b", 2, 3), "C");

    @Test
    void restoresEveryFieldOfTheAnalysis() {
        MapConfidence c = new MapConfidence(true, 2, false, 7, List.of(T), List.of(new AtomRef("a", 1, 2)),
                List.of(new Rearrangement(Rearrangement.Kind.RING_WALK, List.of(new AtomRef("a", 1, 5)), "words")),
                List.of(new Rearrangement(Rearrangement.Kind.CARBON_SHIFT, List.of(), "more words")),
                List.of(new WeightCheck(2, WeightCheck.Outcome.TIED, List.of(T),
                                List.of(new Rearrangement(Rearrangement.Kind.CARBON_SHIFT, List.of(), "shift"))),
                        new WeightCheck(4, WeightCheck.Outcome.ROBUST, List.of())), "");
        ReactionMapping m = new ReactionMapping("R", MapStatus.MAPPED, List.of(T), List.of(), 5, 5, "", List.of(), "",
                new TreeMap<>(), List.of(), new TreeMap<>(), c);
        assertThat(MappingCache.fromJson(MappingCache.toJson(m), "R")).isEqualTo(m);
    }

    @Test
    void readsAnEntryWithoutTheAnalysisAsNotComputed() {
        ReactionMapping m = new ReactionMapping("R", MapStatus.MAPPED, List.of(T), List.of(), 5, 5, "", List.of(), "",
                new TreeMap<>(), List.of(), new TreeMap<>());
        ObjectNode json = MappingCache.toJson(m);
        json.remove("confidence");
        assertThat(MappingCache.fromJson(json, "R").confidence()).isEqualTo(MapConfidence.NONE);
        json.set("confidence", NullNode.getInstance());
        assertThat(MappingCache.fromJson(json, "R").confidence()).isEqualTo(MapConfidence.NONE);
    }
}
