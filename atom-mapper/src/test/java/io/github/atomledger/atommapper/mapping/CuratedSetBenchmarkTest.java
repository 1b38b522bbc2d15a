package io.github.atomledger.atommapper.mapping;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Benchmark (issue 3, set a): the central-carbon and catabolism reactions of the unit tests, mapped
 * cold on two threads; prints per-reaction times for BENCHMARKS.md. Run with -Pbench.
 */
@Tag("bench")
class CuratedSetBenchmarkTest {

    private static final String[] REACTIONS = {
        "glc + atp -> g6p + adp", "g6p -> f6p", "f6p + atp -> fbp + adp", "fbp -> dhap + g3p", "dhap -> g3p",
        "g3p + pi + nad -> bpg + nadh", "bpg + adp -> pg3 + atp", "pg3 -> pg2", "pg2 -> pep + h2o",
        "pep + adp -> pyr + atp", "xu5p + r5p -> g3p + s7p", "s7p + g3p -> e4p + f6p", "xu5p + e4p -> g3p + f6p",
        "pyr + coa -> accoa + co2", "accoa + oaa + h2o -> cit + coa", "cit -> icit", "icit -> akg + co2",
        "akg + coa -> succoa + co2", "succoa + adp + pi -> succ + atp + coa", "succ -> fum", "fum + h2o -> mal",
        "mal -> oaa", "pyr + hco3 + atp -> oaa + adp + pi", "pep + hco3 -> oaa + pi", "icit -> succ + glx",
        "glx + accoa + h2o -> mal + coa", "asp + akg -> oaa + glu", "kic + coa -> ivcoa + co2",
        "acacoa + coa -> 2 accoa", "mcrcoa + hco3 + atp -> mglcoa + adp + pi", "succoa + acac -> succ + acacoa",
        "phe + o2 + bh4 -> tyr + h2o + bh2", "akb + coa -> gly + accoa", "mmcoa -> succoa", "leu + akg -> kic + glu",
        "ivcoa -> mcrcoa", "mglcoa + h2o -> hmgcoa", "hmgcoa -> acac + accoa", "ile + akg -> kmv + glu",
        "kmv + coa -> mbcoa + co2", "mbcoa -> tigcoa", "tigcoa + h2o -> mhbcoa", "mhbcoa -> macoa",
        "macoa + coa -> ppcoa + accoa", "pyr -> acald",
    };

    @Test
    void mapsTheCuratedSet() {
        Reactions fixtures = Metabolites.all();
        List<ReactionInput> inputs = new ArrayList<>();
        for (int i = 0; i < REACTIONS.length; i++) {
            inputs.add(fixtures.reaction("R" + (i + 1), REACTIONS[i]));
        }
        long start = System.nanoTime();
        List<MappingResult> results = new AtomMapper(MappingOptions.defaults()).mapAll(inputs, 2);
        long wall = (System.nanoTime() - start) / 1_000_000;
        List<Long> ms = new ArrayList<>();
        StringBuilder out = new StringBuilder("curated set: " + results.size() + " reactions, wall " + wall + " ms\n");
        for (int i = 0; i < results.size(); i++) {
            MappingResult r = results.get(i);
            ms.add(r.elapsed().toMillis());
            out.append(String.format("  %-45s %-11s cost %3d  %5d ms%n", REACTIONS[i], r.status().label(), r.cost(),
                    r.elapsed().toMillis()));
        }
        ms.sort(null);
        out.append("median ").append(ms.get(ms.size() / 2)).append(" ms, max ").append(ms.get(ms.size() - 1)).append(" ms\n");
        System.out.print(out);
        assertThat(results).hasSize(REACTIONS.length);
    }
}
