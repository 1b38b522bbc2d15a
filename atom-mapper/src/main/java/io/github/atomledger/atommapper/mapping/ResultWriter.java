package io.github.atomledger.atommapper.mapping;

import io.github.atomledger.atommapper.mapping.internal.Prochirality;
import io.github.atomledger.atommapper.mapping.internal.Rearrangements;
import io.github.atomledger.atommapper.mapping.internal.SideGraph;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeMap;
import java.util.TreeSet;

/** Turns an internal map (reactant atom to product atom numbers) into a {@link MappingResult}. */
final class ResultWriter {

    private final SideGraph r;
    private final SideGraph p;
    private final MappingOptions options;

    ResultWriter(SideGraph r, SideGraph p, MappingOptions options) {
        this.r = r;
        this.p = p;
        this.options = options;
    }

    MappingResult result(String id, MappingStatus status, int[] map, int cost, int lower, List<int[]> others,
                         String reason, Duration elapsed) {
        return result(id, status, map, cost, lower, others, reason, elapsed,
                new MapConfidence(false, -1, false, -1, List.of(), List.of(), Rearrangements.find(r, p, map), List.of(),
                        List.of(), ""));
    }

    MappingResult result(String id, MappingStatus status, int[] map, int cost, int lower, List<int[]> others,
                         String reason, Duration elapsed, MapConfidence confidence) {
        List<List<AtomTransition>> alternatives = new ArrayList<>();
        for (int[] m : others) {
            alternatives.add(MappingResult.carbonsOf(transitions(m)));
        }
        int[] inv = new int[p.atomCount()];
        for (int u = 0; u < map.length; u++) {
            inv[map[u]] = u;
        }
        int[] placeR = new int[r.atomCount()];
        int[] placeP = new int[p.atomCount()];
        for (int u = 0; u < map.length; u++) {
            placeR[u] = p.orbitKey(map[u]);
            placeP[map[u]] = r.orbitKey(u);
        }
        List<Prochirality.Flag> flags = new ArrayList<>(Prochirality.find(r, placeR));
        flags.addAll(Prochirality.find(p, placeP));
        TreeSet<AtomRef> prochiral = new TreeSet<>();
        List<String> notes = new ArrayList<>();
        for (Prochirality.Flag f : flags) {
            prochiral.addAll(f.atoms());
            notes.add(f.note());
        }
        return new MappingResult(id, status, transitions(map), edits(map, inv), cost, lower, alternatives, notes,
                List.copyOf(prochiral), mappedSmiles(map), new TreeMap<>(), reason, elapsed, confidence);
    }

    /** Sum over reactant carbons of the change in attached hydrogens. */
    int carbonHydrogenChanges(int[] map) {
        int total = 0;
        for (int u = 0; u < map.length; u++) {
            if (r.element(u).equals("C")) {
                total += Math.abs(r.hydrogens(u) - p.hydrogens(map[u]));
            }
        }
        return total;
    }

    /** Multiset of (reactant class, product class) over carbons, as text: equal iff same up to symmetry. */
    String symmetryKey(int[] map) {
        List<Long> pairs = new ArrayList<>();
        for (int u = 0; u < map.length; u++) {
            if (r.element(u).equals("C")) {
                pairs.add(((long) r.orbitKey(u) << 32) | p.orbitKey(map[u]));
            }
        }
        pairs.sort(null);
        return pairs.toString();
    }

    /** The carbon transitions of a complete map, sorted by {@code from}. */
    List<AtomTransition> carbons(int[] map) {
        return MappingResult.carbonsOf(transitions(map));
    }

    private List<AtomTransition> transitions(int[] map) {
        List<AtomTransition> out = new ArrayList<>();
        for (int u = 0; u < map.length; u++) {
            out.add(new AtomTransition(r.ref(u), p.ref(map[u]), r.element(u)));
        }
        out.sort(null);
        return out;
    }

    private List<BondEdit> edits(int[] map, int[] inv) {
        List<BondEdit> out = new ArrayList<>();
        for (int u = 0; u < map.length; u++) {
            for (int v : r.neighbours(u)) {
                if (u < v) {
                    int before = r.bond(u, v);
                    int after = p.bond(map[u], map[v]);
                    if (after == 0) {
                        out.add(edit(BondEdit.Kind.BROKEN, u, v, map, before, 0,
                                options.bondWeight(r.element(u), r.element(v))));
                    } else if (after != before) {
                        out.add(edit(BondEdit.Kind.ORDER_CHANGED, u, v, map, before, after, options.orderChangeWeight()));
                    }
                }
            }
        }
        for (int x = 0; x < inv.length; x++) {
            for (int y : p.neighbours(x)) {
                if (x < y && r.bond(inv[x], inv[y]) == 0) {
                    out.add(edit(BondEdit.Kind.FORMED, inv[x], inv[y], map, 0, p.bond(x, y),
                            options.bondWeight(p.element(x), p.element(y))));
                }
            }
        }
        out.sort(null);
        return out;
    }

    private BondEdit edit(BondEdit.Kind kind, int u, int v, int[] map, int before, int after, int weight) {
        AtomRef a = r.ref(u);
        AtomRef b = r.ref(v);
        if (a.compareTo(b) > 0) {
            int t = u;
            u = v;
            v = t;
        }
        return new BondEdit(kind, r.ref(u), r.ref(v), p.ref(map[u]), p.ref(map[v]), before, after, weight);
    }

    private String mappedSmiles(int[] map) {
        int[] number = new int[p.atomCount()];
        for (int u = 0; u < map.length; u++) {
            number[map[u]] = u + 1;
        }
        return side(r, null) + ">>" + side(p, number);
    }

    private static String side(SideGraph g, int[] number) {
        StringBuilder out = new StringBuilder();
        for (int m = 0; m < g.moleculeCount(); m++) {
            int off = g.offset(m);
            int[] classes = new int[g.structure(m).heavyAtomCount()];
            for (int i = 0; i < classes.length; i++) {
                classes[i] = number == null ? off + i + 1 : number[off + i];
            }
            if (out.length() > 0) {
                out.append('.');
            }
            out.append(g.structure(m).smilesWithAtomClasses(classes));
        }
        return out.toString();
    }
}
