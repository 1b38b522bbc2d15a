package io.github.atomledger.atommapper.mapping;

import io.github.atomledger.atommapper.mapping.internal.Search;
import io.github.atomledger.atommapper.mapping.internal.SearchClock;
import io.github.atomledger.atommapper.mapping.internal.SideGraph;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.SortedMap;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

/**
 * Exact atom-atom mapping by minimum chemical distance (Jochum, Gasteiger &amp; Ugi 1980): the map
 * of all heavy atoms that needs the smallest weighted number of bond edits (broken, formed, order
 * changed), with a proof of optimality.
 *
 * <pre>{@code
 * AtomMapper mapper = new AtomMapper(MappingOptions.defaults());
 * MappingResult r = mapper.map(new ReactionInput("PYK", reactants, products));
 * if (r.status() == MappingStatus.MAPPED) {
 *     r.carbonTransitions().forEach(System.out::println);
 * }
 * }</pre>
 *
 * <p>Hydrogens are implicit and charges are ignored, so a proton left out or a neutral drawing of
 * an ion never blocks a map. Co-optimal maps are compared up to the molecules' automorphisms; when
 * some carbon can end in different places the result is {@link MappingStatus#AMBIGUOUS}.
 *
 * <p>Thread-safety: an instance holds only its options and may be shared; {@link #mapAll} maps in
 * parallel and returns results in input order, equal for any thread count (unless a time budget is
 * hit, which depends on the machine). Null arguments throw {@link NullPointerException}.
 *
 * <p>Does not handle: stereochemistry (ignored; prochiral branches are flagged), hydrogen
 * transitions, polymers, fractional coefficients (use {@link MappingResult#unmappable}). A
 * proven minimum is a criterion, not the mechanism: it does not replace expert review.
 */
public final class AtomMapper {

    /** Version of the mapping algorithm; part of any cache key together with the options' fingerprint. */
    public static final String VERSION = "2";

    private final MappingOptions options;

    /** A mapper with the given options. */
    public AtomMapper(MappingOptions options) {
        this.options = Objects.requireNonNull(options, "options");
    }

    /** The options of this mapper. */
    public MappingOptions options() {
        return options;
    }

    /** Maps one reaction; never throws for chemistry problems (they are statuses). */
    public MappingResult map(ReactionInput reaction) {
        return map(reaction, List.of());
    }

    /**
     * The optimum subject to pinned transitions (typically curated carbon transitions). The cost
     * difference to the free optimum says how many more weighted bond edits the pins need.
     * Infeasible pins (unknown atom, element mismatch, an atom pinned twice) give
     * {@link MappingStatus#UNMAPPABLE} with the reason.
     */
    public MappingResult map(ReactionInput reaction, List<AtomTransition> pins) {
        Objects.requireNonNull(reaction, "reaction");
        Objects.requireNonNull(pins, "pins");
        long start = System.nanoTime();
        String id = reaction.reactionId();
        SortedMap<String, Long> difference = heavyDifference(reaction);
        if (!difference.isEmpty()) {
            StringBuilder text = new StringBuilder();
            difference.forEach((e, d) -> text.append(text.length() == 0 ? "" : ", ").append(e).append(' ')
                    .append(d > 0 ? "+" : "").append(d));
            return new MappingResult(id, MappingStatus.UNMAPPABLE, List.of(), List.of(), -1, -1, List.of(),
                    List.of(), List.of(), "", difference, "heavy atoms do not balance (products minus reactants: "
                    + text + ")", elapsed(start));
        }
        int heavy = 0;
        for (Participant part : reaction.reactants()) {
            heavy += part.structure().heavyAtomCount() * part.coefficient();
        }
        // Checked before any graph is built: the side graphs keep an n-by-n bond table.
        if (heavy > options.maxHeavyAtoms()) {
            return new MappingResult(id, MappingStatus.TOO_LARGE, List.of(), List.of(), -1, -1, List.of(), List.of(),
                    List.of(), "", new TreeMap<>(), "each side has " + heavy
                    + " heavy atoms, more than the cap of " + options.maxHeavyAtoms(), elapsed(start));
        }
        Map<String, Integer> elementIds = new HashMap<>();
        Map<String, Integer> orbitIds = new HashMap<>();
        SideGraph r = new SideGraph(reaction.reactants(), elementIds, orbitIds);
        SideGraph p = new SideGraph(reaction.products(), elementIds, orbitIds);
        int[] pin = new int[r.atomCount()];
        Arrays.fill(pin, -1);
        String pinProblem = resolvePins(r, p, pins, pin);
        if (pinProblem != null) {
            return new MappingResult(id, MappingStatus.UNMAPPABLE, List.of(), List.of(), -1, -1, List.of(), List.of(),
                    List.of(), "", new TreeMap<>(), pinProblem, elapsed(start));
        }
        Search search = new Search(r, p, options, pin, SearchClock.now() + options.timeBudget().toNanos());
        boolean proven = search.optimise();
        int[] best = search.best();
        int lower = search.lowerBound();
        ResultWriter writer = new ResultWriter(r, p, options);
        if (best == null) {
            return new MappingResult(id, MappingStatus.BEST_FOUND, List.of(), List.of(), -1, lower, List.of(),
                    List.of(), List.of(), "", new TreeMap<>(), "the budget ran out before any complete map was found",
                    elapsed(start));
        }
        if (!proven) {
            return writer.result(id, MappingStatus.BEST_FOUND, best, search.upper(), lower, List.of(),
                    "the time or node budget ran out before the optimum was proven (best " + search.upper()
                    + ", proven lower bound " + lower + ")", elapsed(start));
        }
        boolean complete = search.enumerateCoOptimal();
        // Ties in bond edits are broken by the carbons' hydrogen changes: the C-H bonds that the
        // implicit-hydrogen graph does not see, but that the full BE-matrix distance counts.
        List<int[]> candidates = new ArrayList<>();
        candidates.add(best);
        candidates.addAll(search.coOptimal());
        int fewest = Integer.MAX_VALUE;
        for (int[] m : candidates) {
            fewest = Math.min(fewest, writer.carbonHydrogenChanges(m));
        }
        int[] main = null;
        List<int[]> others = new ArrayList<>();
        TreeSet<String> keys = new TreeSet<>();
        for (int[] m : candidates) {
            if (writer.carbonHydrogenChanges(m) != fewest || !keys.add(writer.symmetryKey(m))) {
                continue;
            }
            if (main == null) {
                main = m;
            } else if (others.size() < options.maxAlternatives()) {
                others.add(m);
            }
        }
        best = main;
        if (!complete) {
            return others.isEmpty()
                    ? writer.result(id, MappingStatus.BEST_FOUND, best, search.upper(), search.upper(), List.of(),
                    "the optimal cost is proven, but the check for other co-optimal carbon maps hit the budget",
                    elapsed(start))
                    : writer.result(id, MappingStatus.AMBIGUOUS, best, search.upper(), search.upper(), others,
                    "more co-optimal maps may exist: their enumeration hit the budget", elapsed(start));
        }
        MappingStatus status = others.isEmpty() ? MappingStatus.MAPPED : MappingStatus.AMBIGUOUS;
        if (!pins.isEmpty() || options.confidenceBudget().isZero()) {
            return writer.result(id, status, best, search.upper(), search.upper(), others, "", elapsed(start));
        }
        // Every co-optimal class is known now, so the runner-up search can exclude them all.
        TreeSet<String> reported = new TreeSet<>();
        reported.add(search.carbonClass(best));
        others.forEach(m -> reported.add(search.carbonClass(m)));
        MapConfidence confidence = new ConfidenceAnalysis(r, p, options, writer)
                .analyse(search, best, reported, search.upper());
        return writer.result(id, status, best, search.upper(), search.upper(), others, "", elapsed(start),
                confidence);
    }

    /**
     * Maps many reactions on {@code threads} threads (at least 1). Results are in input order and do
     * not depend on the thread count.
     */
    public List<MappingResult> mapAll(List<ReactionInput> reactions, int threads) {
        Objects.requireNonNull(reactions, "reactions");
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, got " + threads);
        }
        if (threads == 1) {
            return reactions.stream().map(this::map).toList();
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        try {
            List<Future<MappingResult>> futures = new ArrayList<>();
            for (ReactionInput reaction : reactions) {
                futures.add(pool.submit(() -> map(reaction)));
            }
            List<MappingResult> out = new ArrayList<>();
            for (Future<MappingResult> f : futures) {
                out.add(f.get());
            }
            return out;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while mapping", e);
        } catch (ExecutionException e) {
            throw new IllegalStateException("mapping failed: " + e.getCause(), e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }

    /**
     * True when two carbon maps of {@code reaction} are the same up to the symmetry of its
     * molecules: every reactant carbon class is sent to the same product carbon classes, counted
     * with multiplicity. Transitions of other elements are ignored.
     *
     * @throws IllegalArgumentException when a transition names an atom that is not in the reaction
     */
    public static boolean sameUpToSymmetry(ReactionInput reaction, List<AtomTransition> first,
                                           List<AtomTransition> second) {
        Map<String, Integer> elementIds = new HashMap<>();
        Map<String, Integer> orbitIds = new HashMap<>();
        SideGraph r = new SideGraph(reaction.reactants(), elementIds, orbitIds);
        SideGraph p = new SideGraph(reaction.products(), elementIds, orbitIds);
        return classPairs(r, p, first).equals(classPairs(r, p, second));
    }

    private static List<Long> classPairs(SideGraph r, SideGraph p, List<AtomTransition> transitions) {
        List<Long> pairs = new ArrayList<>();
        for (AtomTransition t : transitions) {
            int u = r.indexOf(t.from());
            int x = p.indexOf(t.to());
            if (u < 0 || x < 0) {
                throw new IllegalArgumentException("no such atom in the reaction: " + (u < 0 ? t.from() : t.to()));
            }
            if (r.element(u).equals("C")) {
                pairs.add(((long) r.orbitKey(u) << 32) | p.orbitKey(x));
            }
        }
        pairs.sort(null);
        return pairs;
    }

    private static String resolvePins(SideGraph r, SideGraph p, List<AtomTransition> pins, int[] pin) {
        boolean[] taken = new boolean[p.atomCount()];
        for (AtomTransition t : pins) {
            int u = r.indexOf(t.from());
            int x = p.indexOf(t.to());
            if (u < 0) {
                return "pinned atom " + t.from() + " is not a reactant atom";
            }
            if (x < 0) {
                return "pinned atom " + t.to() + " is not a product atom";
            }
            if (!r.element(u).equals(p.element(x))) {
                return "pin " + t.from() + " -> " + t.to() + " joins " + r.element(u) + " to " + p.element(x);
            }
            if (pin[u] >= 0 || taken[x]) {
                return "pin " + t.from() + " -> " + t.to() + " uses an atom that another pin already uses";
            }
            pin[u] = x;
            taken[x] = true;
        }
        return null;
    }

    private static SortedMap<String, Long> heavyDifference(ReactionInput reaction) {
        SortedMap<String, Long> diff = new TreeMap<>();
        for (Participant part : reaction.products()) {
            part.structure().formula().counts().forEach((e, n) -> diff.merge(e, n * part.coefficient(), Long::sum));
        }
        for (Participant part : reaction.reactants()) {
            part.structure().formula().counts().forEach((e, n) -> diff.merge(e, -n * part.coefficient(), Long::sum));
        }
        diff.remove("H");
        diff.values().removeIf(v -> v == 0);
        return diff;
    }

    private static Duration elapsed(long start) {
        return Duration.ofNanos(System.nanoTime() - start);
    }
}
