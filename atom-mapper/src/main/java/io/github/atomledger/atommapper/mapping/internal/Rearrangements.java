package io.github.atomledger.atommapper.mapping.internal;

import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.mapping.Rearrangement;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Recognises rearrangement patterns ({@link Rearrangement.Kind}) in one complete map from the
 * bonds it breaks and forms. Ring membership is read from the reactant side: a bond lies on a
 * ring when it is no bridge, and two atoms share a ring system when bonds on rings connect them.
 * Deterministic: patterns come in reactant atom order. Stateless.
 */
public final class Rearrangements {

    private Rearrangements() {
    }

    /** The patterns in {@code map} (reactant atom to product atom, complete). */
    public static List<Rearrangement> find(SideGraph r, SideGraph p, int[] map) {
        int[] inv = new int[p.n];
        for (int u = 0; u < map.length; u++) {
            inv[map[u]] = u;
        }
        List<int[]> broken = new ArrayList<>();
        for (int u = 0; u < r.n; u++) {
            for (int v : r.nbr[u]) {
                if (u < v && p.bond[map[u]][map[v]] == 0) {
                    broken.add(new int[] {u, v});
                }
            }
        }
        List<int[]> formed = new ArrayList<>();
        for (int x = 0; x < p.n; x++) {
            for (int y : p.nbr[x]) {
                if (x < y && r.bond[inv[x]][inv[y]] == 0) {
                    int a = Math.min(inv[x], inv[y]);
                    int b = Math.max(inv[x], inv[y]);
                    formed.add(new int[] {a, b});
                }
            }
        }
        formed.sort((a, b) -> a[0] != b[0] ? Integer.compare(a[0], b[0]) : Integer.compare(a[1], b[1]));
        Rings ringsR = new Rings(r);
        Rings ringsP = new Rings(p);
        boolean[] usedBroken = new boolean[broken.size()];
        boolean[] usedFormed = new boolean[formed.size()];
        List<Rearrangement> out = new ArrayList<>();
        for (int i = 0; i < broken.size(); i++) {
            for (int j = 0; j < formed.size() && !usedBroken[i]; j++) {
                if (usedFormed[j]) {
                    continue;
                }
                int[] shift = shared(broken.get(i), formed.get(j));
                if (shift == null || r.molecule[shift[0]] != r.molecule[shift[1]]
                        || r.molecule[shift[0]] != r.molecule[shift[2]]) {
                    continue;
                }
                int g = shift[0];
                int a = shift[1];
                int b = shift[2];
                boolean neighbours = r.bond[a][b] != 0 && p.bond[map[a]][map[b]] != 0;
                if (r.element[g].equals("C") && (neighbours || ringsR.sameSystem(a, b))) {
                    out.add(new Rearrangement(Rearrangement.Kind.CARBON_SHIFT, refs(r, g, a, b), neighbours
                            ? "1,2-shift: the carbon group at " + name(r, g) + " leaves " + atom(r, a)
                                    + " for its neighbour " + atom(r, b)
                            : "a carbon group moving around a ring: " + name(r, g) + " leaves ring " + atom(r, a)
                                    + " for ring " + atom(r, b)));
                    usedBroken[i] = true;
                    usedFormed[j] = true;
                }
            }
        }
        ringWalks(r, p, map, broken, formed, usedBroken, usedFormed, ringsR, ringsP, out);
        boolean[] moleculeDone = new boolean[r.moleculeCount()];
        for (int i = 0; i < broken.size(); i++) {
            int[] bb = broken.get(i);
            int m = r.molecule[bb[0]];
            if (usedBroken[i] || moleculeDone[m] || !skeletonBond(r, bb[0], bb[1])) {
                continue;
            }
            for (int j = 0; j < formed.size(); j++) {
                int[] ff = formed.get(j);
                if (usedFormed[j] || r.molecule[ff[0]] != m || r.molecule[ff[1]] != m
                        || !r.element[ff[0]].equals("C") || !r.element[ff[1]].equals("C")) {
                    continue;
                }
                out.add(new Rearrangement(Rearrangement.Kind.SKELETON_REARRANGEMENT, refs(r, bb[0], bb[1], ff[0], ff[1]),
                        "skeleton rearrangement in " + molecule(r, m) + ": the " + r.element[bb[0]] + "–"
                                + r.element[bb[1]] + " bond between " + atom(r, bb[0]) + " and " + atom(r, bb[1])
                                + " is broken and a C–C bond between " + atom(r, ff[0]) + " and " + atom(r, ff[1])
                                + " formed"));
                moleculeDone[m] = true;
                break;
            }
        }
        return out;
    }

    /**
     * A ring atom that loses an exocyclic heteroatom while another atom of the same ring system
     * gains an exocyclic heteroatom of the same element: the same atom moving, or one leaving and
     * another (say from O2) arriving; the carbons' fate is the same either way.
     */
    private static void ringWalks(SideGraph r, SideGraph p, int[] map, List<int[]> broken, List<int[]> formed,
                                  boolean[] usedBroken, boolean[] usedFormed, Rings ringsR, Rings ringsP,
                                  List<Rearrangement> out) {
        for (int i = 0; i < broken.size(); i++) {
            if (usedBroken[i]) {
                continue;
            }
            int[] lost = ringSubstituent(r, broken.get(i)[0], broken.get(i)[1], ringsR);
            if (lost == null) {
                continue;
            }
            for (int j = 0; j < formed.size(); j++) {
                int[] f = formed.get(j);
                if (usedFormed[j]) {
                    continue;
                }
                int[] gained = ringSubstituent(r, f[0], f[1], null);
                if (gained == null || !r.element[gained[1]].equals(r.element[lost[1]])
                        || gained[0] == lost[0] || !ringsR.sameSystem(lost[0], gained[0])
                        || !ringsP.bridge(map[gained[0]], map[gained[1]])) {
                    continue;
                }
                int a = lost[0];
                int b = gained[0];
                String what = lost[1] == gained[1] ? "the " + r.element[lost[1]] + " at " + name(r, lost[1])
                        + " leaves ring " + atom(r, a) + " for ring " + atom(r, b)
                        : "ring " + atom(r, a) + " of " + molecule(r, r.molecule[a]) + " loses its "
                        + r.element[lost[1]] + " and ring " + atom(r, b) + " gains one";
                out.add(new Rearrangement(Rearrangement.Kind.RING_WALK, refs(r, lost[1], a, b),
                        "a heteroatom moving around a ring: " + what));
                usedBroken[i] = true;
                usedFormed[j] = true;
                break;
            }
        }
    }

    /**
     * For a bond between a ring carbon and a heteroatom: {ring carbon, heteroatom}, else null. With
     * {@code rings} the bond must also lie on no ring of that side (an exocyclic substituent).
     */
    private static int[] ringSubstituent(SideGraph r, int u, int v, Rings rings) {
        for (int k = 0; k < 2; k++) {
            int c = k == 0 ? u : v;
            int x = k == 0 ? v : u;
            if (r.element[c].equals("C") && !r.element[x].equals("C")
                    && (rings == null || rings.system[c] >= 0 && rings.bridge(c, x))) {
                return new int[] {c, x};
            }
        }
        return null;
    }

    /** For a broken and a formed bond sharing one atom: {shared, other end of broken, other end of formed}. */
    private static int[] shared(int[] broken, int[] formed) {
        for (int i = 0; i < 2; i++) {
            for (int j = 0; j < 2; j++) {
                if (broken[i] == formed[j] && broken[1 - i] != formed[1 - j]) {
                    return new int[] {broken[i], broken[1 - i], formed[1 - j]};
                }
            }
        }
        return null;
    }

    /** C–C, or carbon to a heteroatom bonded to two carbons (an ether or similar bridge of the skeleton). */
    private static boolean skeletonBond(SideGraph r, int a, int b) {
        boolean ca = r.element[a].equals("C");
        boolean cb = r.element[b].equals("C");
        if (ca && cb) {
            return true;
        }
        int hetero = ca ? b : cb ? a : -1;
        if (hetero < 0) {
            return false;
        }
        int carbons = 0;
        for (int n : r.nbr[hetero]) {
            if (r.element[n].equals("C")) {
                carbons++;
            }
        }
        return carbons >= 2;
    }

    /**
     * Ring facts of one side graph: which bonds are bridges (on no ring) and, for each atom, the
     * number of its ring system (atoms joined by bonds that lie on a ring), -1 for an atom on no
     * ring. Bridges come from an iterative depth-first search (Tarjan's low-link).
     */
    static final class Rings {
        private final int[] disc;
        private final int[] low;
        private final int[] parent;
        final int[] system;

        Rings(SideGraph g) {
            disc = new int[g.n];
            low = new int[g.n];
            parent = new int[g.n];
            Arrays.fill(disc, -1);
            int time = 0;
            int[] next = new int[g.n];
            for (int s = 0; s < g.n; s++) {
                if (disc[s] >= 0) {
                    continue;
                }
                ArrayDeque<Integer> stack = new ArrayDeque<>();
                disc[s] = low[s] = time++;
                parent[s] = -1;
                stack.push(s);
                while (!stack.isEmpty()) {
                    int a = stack.peek();
                    if (next[a] < g.nbr[a].length) {
                        int b = g.nbr[a][next[a]++];
                        if (disc[b] < 0) {
                            disc[b] = low[b] = time++;
                            parent[b] = a;
                            stack.push(b);
                        } else if (b != parent[a]) {
                            low[a] = Math.min(low[a], disc[b]);
                        }
                    } else {
                        stack.pop();
                        if (parent[a] >= 0) {
                            low[parent[a]] = Math.min(low[parent[a]], low[a]);
                        }
                    }
                }
            }
            system = new int[g.n];
            Arrays.fill(system, -1);
            int count = 0;
            for (int s = 0; s < g.n; s++) {
                if (system[s] >= 0 || !onRing(g, s)) {
                    continue;
                }
                ArrayDeque<Integer> queue = new ArrayDeque<>();
                queue.add(s);
                system[s] = count;
                while (!queue.isEmpty()) {
                    int a = queue.poll();
                    for (int b : g.nbr[a]) {
                        if (!bridge(a, b) && system[b] < 0) {
                            system[b] = count;
                            queue.add(b);
                        }
                    }
                }
                count++;
            }
        }

        private boolean onRing(SideGraph g, int a) {
            for (int b : g.nbr[a]) {
                if (!bridge(a, b)) {
                    return true;
                }
            }
            return false;
        }

        /** True when the bond a–b (which must exist) lies on no ring. */
        boolean bridge(int a, int b) {
            if (parent[b] == a) {
                return low[b] > disc[a];
            }
            return parent[a] == b && low[a] > disc[b];
        }

        /** True when both atoms lie on rings of one ring system. */
        boolean sameSystem(int a, int b) {
            return system[a] >= 0 && system[a] == system[b];
        }
    }

    private static List<AtomRef> refs(SideGraph r, int... atoms) {
        List<AtomRef> out = new ArrayList<>();
        for (int a : atoms) {
            out.add(r.ref(a));
        }
        return out;
    }

    private static String molecule(SideGraph g, int m) {
        AtomRef first = g.ref(g.offset(m));
        return first.copy() == 1 ? first.species() : first.species() + "#" + first.copy();
    }

    private static String name(SideGraph g, int a) {
        return molecule(g, g.molecule[a]) + " " + atom(g, a);
    }

    /** The atom's readable position ("C3") where its structure has atom classes, else "atom 7" (its index). */
    private static String atom(SideGraph g, int a) {
        String label = g.structure(g.molecule[a]).atomLabel(g.local[a] + 1);
        return label.chars().allMatch(Character::isDigit) ? "atom " + label : label;
    }
}
