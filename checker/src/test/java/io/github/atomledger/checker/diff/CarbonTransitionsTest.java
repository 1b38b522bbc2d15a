package io.github.atomledger.checker.diff;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.checker.check.mapping.MapStatus;
import io.github.atomledger.checker.check.mapping.ReactionMapping;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

class CarbonTransitionsTest {

    private static final List<AtomTransition> ONE = List.of(
            new AtomTransition(new AtomRef("g6p_c", 1, 1), new AtomRef("f6p_c", 1, 1), "C"));
    private static final List<AtomTransition> TWO = List.of(
            new AtomTransition(new AtomRef("g6p_c", 1, 1), new AtomRef("f6p_c", 1, 2), "C"));

    private static ModelResult withMaps(ModelResult m, Map<String, ReactionMapping> maps) {
        List<ReactionResult> reactions = m.reactions().stream()
                .map(r -> new ReactionResult(r.reaction(), r.balance(), r.findings(), maps.get(r.id()))).toList();
        return new ModelResult(m.model(), reactions, m.modelFindings(), m.mapping());
    }

    private static ReactionMapping mapping(String id, MapStatus status, List<AtomTransition> carbons) {
        return new ReactionMapping(id, status, carbons, List.of(), 1, 1, "", List.of(), "", new TreeMap<>(), List.of(),
                new TreeMap<>());
    }

    @Test
    void computedTakesTheRunsMapsOfMappedReactionsOnly() {
        ModelResult m = withMaps(ReleaseDiffTest.checked("release-1.xml"), Map.of(
                "R_PGI", mapping("R_PGI", MapStatus.MAPPED, ONE),
                "R_HEX", ReactionMapping.without("R_HEX", MapStatus.NO_STRUCTURE, "no structure for atp_c", List.of("atp_c"))));
        assertThat(CarbonTransitions.COMPUTED.carbons(m, null)).containsExactly(Map.entry("R_PGI", ONE));
    }

    @Test
    void firstOfPrefersTheFirstSourcePerReaction() {
        CarbonTransitions first = (r, f) -> Map.of("R_PGI", ONE);
        CarbonTransitions second = (r, f) -> Map.of("R_PGI", TWO, "R_TPI", TWO);
        assertThat(CarbonTransitions.firstOf(first, second).carbons(null, null))
                .containsExactlyInAnyOrderEntriesOf(Map.of("R_PGI", ONE, "R_TPI", TWO));
    }
}
