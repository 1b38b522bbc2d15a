package io.github.atomledger.atommapper.mapping;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.atommapper.structure.StructureException;

import java.time.Duration;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/**
 * Issue 7: the mapper's budgets hold under structures built to blow up a graph search: a large
 * macrocycle, long chains, many identical copies (coefficient 50) and a big symmetric cage
 * (buckminsterfullerene C60, 120 rotational and reflection symmetries; icosahedral point group
 * I_h, handbook fact). Every reaction must end with a status inside the budget; the
 * {@link Timeout}s are hang guards only, far above the budgets, not performance assertions.
 */
class AdversarialMappingTest {

    /** A small time budget and node limit so that the guards are far away. */
    private static final MappingOptions TIGHT = MappingOptions.defaults()
            .withTimeBudget(Duration.ofMillis(500)).withNodeLimit(200_000);

    /** C60 (buckminsterfullerene) as a Kekulé SMILES, from memory; checked below to have 60 carbons, 90 bonds. */
    private static final String C60 = "C12=C3C4=C5C6=C1C7=C8C9=C1C%10=C%11C(=C29)C3=C2C3=C4C4=C5C5=C9C6=C7C6=C7C8=C1C1=C8"
            + "C%10=C%10C%11=C2C2=C3C3=C4C4=C5C5=C%11C%12=C(C6=C95)C7=C1C1=C%12C5=C%11C4=C3C3=C5C(=C81)C%10=C23";

    private static Participant p(String id, String smiles, int coefficient) throws StructureException {
        return new Participant(id, Structure.fromSmiles(smiles), coefficient);
    }

    private static MappingResult map(MappingOptions options, String id, List<Participant> left, List<Participant> right) {
        return new AtomMapper(options).map(new ReactionInput(id, left, right));
    }

    @Test
    void fullereneIsReadAsSixtyCarbonsWithNinetyBonds() throws StructureException {
        Structure c60 = Structure.fromSmiles(C60);
        assertThat(c60.heavyAtomCount()).isEqualTo(60);
        assertThat(c60.formula().toHillString()).isEqualTo("C60");
        int bonds = 0;
        for (int i = 0; i < 60; i++) {
            bonds += c60.graph().neighbours(i).length;
        }
        assertThat(bonds / 2).isEqualTo(90);
    }

    @Test
    @Timeout(value = 120, unit = TimeUnit.SECONDS)
    void fullereneIdentityEndsWithinTheBudget() throws StructureException {
        MappingResult r = map(TIGHT, "C60_ID", List.of(p("c60", C60, 1)), List.of(p("c60", C60, 1)));
        assertThat(r.status()).isIn(MappingStatus.MAPPED, MappingStatus.AMBIGUOUS, MappingStatus.BEST_FOUND);
        assertThat(r.atomMap()).hasSize(60);
        assertThat(r.lowerBound()).isLessThanOrEqualTo(r.cost());
    }

    @Test
    @Timeout(value = 120, unit = TimeUnit.SECONDS)
    void fullereneWithListedPartnersInAnotherOrderEndsWithinTheBudget() throws StructureException {
        MappingResult r = map(TIGHT, "C60_O2", List.of(p("c60", C60, 1), p("o2", "O=O", 1)),
                List.of(p("o2", "O=O", 1), p("c60", C60, 1)));
        assertThat(r.status()).isIn(MappingStatus.MAPPED, MappingStatus.AMBIGUOUS, MappingStatus.BEST_FOUND);
        assertThat(r.atomMap()).hasSize(62);
    }

    @Test
    @Timeout(value = 120, unit = TimeUnit.SECONDS)
    void largeMacrocycleRingOpeningEndsWithinTheBudget() throws StructureException {
        // Cyclohexacontane (a 60-membered carbocycle) opened to hexacontene: one C-C bond broken.
        String ring = "C1" + "C".repeat(58) + "C1";
        String chain = "C=C" + "C".repeat(58);
        MappingResult r = map(TIGHT, "RING60", List.of(p("ring", ring, 1)), List.of(p("chain", chain, 1)));
        assertThat(r.status()).isIn(MappingStatus.MAPPED, MappingStatus.AMBIGUOUS, MappingStatus.BEST_FOUND);
        assertThat(r.atomMap()).hasSize(60);
        assertThat(r.lowerBound()).isLessThanOrEqualTo(r.cost());
    }

    @Test
    @Timeout(value = 120, unit = TimeUnit.SECONDS)
    void longPolymerCleavageEndsWithinTheBudget() throws StructureException {
        // A 300-carbon polyethylene chain cut into two 150-carbon chains (heavy atoms balance).
        String c300 = "C".repeat(300);
        String c150 = "C".repeat(150);
        MappingResult r = map(TIGHT, "PE300", List.of(p("pe300", c300, 1)), List.of(p("pe150", c150, 2)));
        assertThat(r.status()).isIn(MappingStatus.MAPPED, MappingStatus.AMBIGUOUS, MappingStatus.BEST_FOUND);
        assertThat(r.atomMap()).hasSize(300);
    }

    @Test
    void chainOverTheSizeCapIsTooLargeWithoutSearching() throws StructureException {
        String c500 = "C".repeat(500);
        MappingResult r = map(TIGHT, "PE500", List.of(p("pe500", c500, 1)), List.of(p("pe250", "C".repeat(250), 2)));
        assertThat(r.status()).isEqualTo(MappingStatus.TOO_LARGE);
        assertThat(r.reason()).contains("500").contains("cap of 400");
    }

    @Test
    void fiftyCopiesOverTheSizeCapAreTooLarge() throws StructureException {
        // Copies count towards the cap: 50 glucose are 600 heavy atoms per side.
        String glucose = "OC[C@H]1OC(O)[C@H](O)[C@@H](O)[C@@H]1O";
        MappingResult r = map(TIGHT, "GLC50", List.of(p("glc", glucose, 50)), List.of(p("glc", glucose, 50)));
        assertThat(r.status()).isEqualTo(MappingStatus.TOO_LARGE);
    }

    @Test
    @Timeout(value = 120, unit = TimeUnit.SECONDS)
    void fiftyIdenticalCopiesEndWithinTheBudget() throws StructureException {
        // 50 ethanol + 25 O2 -> 50 acetaldehyde + 50 water: heavy atoms balance, 200 per side.
        MappingResult r = map(TIGHT, "ADH50",
                List.of(p("etoh", "CCO", 50), p("o2", "O=O", 25)),
                List.of(p("acald", "CC=O", 50), p("h2o", "O", 50)));
        assertThat(r.status()).isIn(MappingStatus.MAPPED, MappingStatus.AMBIGUOUS, MappingStatus.BEST_FOUND);
        assertThat(r.atomMap()).hasSize(200);
    }

    @Test
    void unbalancedFullereneIsUnmappableAtOnce() throws StructureException {
        MappingResult r = map(TIGHT, "C60_LOSS", List.of(p("c60", C60, 1)), List.of(p("c58", "C".repeat(58), 1)));
        assertThat(r.status()).isEqualTo(MappingStatus.UNMAPPABLE);
        assertThat(r.reason()).contains("C");
    }
}
