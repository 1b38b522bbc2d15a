package io.github.atomledger.atommapper.mapping.internal;

import io.github.atomledger.atommapper.mapping.MappingOptions;

/**
 * Improves a complete map by swapping the images of two same-element reactant atoms while that
 * lowers the cost. Used only to tighten the incumbent (upper bound) of {@link Search}; it never
 * decides anything the search has not proven.
 */
final class LocalSearch {

    private static final int MAX_PASSES = 10;

    private final SideGraph r;
    private final SideGraph p;
    private final MappingOptions options;
    private final int[] pin;

    LocalSearch(SideGraph r, SideGraph p, MappingOptions options, int[] pin) {
        this.r = r;
        this.p = p;
        this.options = options;
        this.pin = pin;
    }

    /** Improves {@code map} in place; returns its cost afterwards. */
    int improve(int[] map, int cost) {
        int[] inv = new int[p.n];
        for (int u = 0; u < map.length; u++) {
            inv[map[u]] = u;
        }
        return polishWithin(map, inv, cost, m -> true);
    }

    /** The exact cost of a complete map. */
    int cost(int[] map) {
        int total = 0;
        int[] inv = new int[p.n];
        for (int u = 0; u < map.length; u++) {
            inv[map[u]] = u;
        }
        for (int u = 0; u < r.n; u++) {
            for (int v : r.nbr[u]) {
                if (u < v) {
                    total += edit(map, u, v);
                }
            }
        }
        for (int x = 0; x < p.n; x++) {
            for (int y : p.nbr[x]) {
                if (x < y && r.bond[inv[x]][inv[y]] == 0) {
                    total += options.bondWeight(p.element[x], p.element[y]);
                }
            }
        }
        return total;
    }

    /** How many single carbon swaps of the optimum are polished into runner-up seeds. */
    private static final int SEEDS = 6;

    /**
     * A cheap complete map whose carbon class {@code allowed} accepts, to seed the runner-up
     * search with an incumbent: the cheapest single swaps of two carbons' images in {@code main}
     * that leave the excluded classes, each polished by swaps that keep it outside them. Returns
     * null when no swap leaves them; else the map, with its cost in {@code cost[0]}.
     */
    int[] otherClass(int[] main, int mainCost, java.util.function.Predicate<int[]> allowed, int[] cost) {
        int[] map = main.clone();
        int[] inv = new int[p.n];
        for (int u = 0; u < map.length; u++) {
            inv[map[u]] = u;
        }
        java.util.List<long[]> swaps = new java.util.ArrayList<>();
        for (int a = 0; a < r.n; a++) {
            if (pin[a] >= 0 || !r.element[a].equals("C")) {
                continue;
            }
            for (int b = a + 1; b < r.n; b++) {
                if (pin[b] >= 0 || !r.element[b].equals("C")
                        || r.orbitKey[a] == r.orbitKey[b] && p.orbitKey[map[a]] == p.orbitKey[map[b]]) {
                    continue;
                }
                int before = local(map, inv, a, b) + local(map, inv, b, a) + edit(map, a, b);
                swap(map, inv, a, b);
                int after = local(map, inv, a, b) + local(map, inv, b, a) + edit(map, a, b);
                swap(map, inv, a, b);
                swaps.add(new long[] {after - before, a, b});
            }
        }
        swaps.sort((x, y) -> x[0] != y[0] ? Long.compare(x[0], y[0])
                : x[1] != y[1] ? Long.compare(x[1], y[1]) : Long.compare(x[2], y[2]));
        int[] best = null;
        int tried = 0;
        for (long[] s : swaps) {
            if (tried >= SEEDS) {
                break;
            }
            int[] m = map.clone();
            int[] mi = inv.clone();
            swap(m, mi, (int) s[1], (int) s[2]);
            if (!allowed.test(m)) {
                continue;
            }
            tried++;
            int c = polishWithin(m, mi, mainCost + (int) s[0], allowed);
            if (best == null || c < cost[0]) {
                best = m;
                cost[0] = c;
            }
        }
        return best;
    }

    /**
     * Swaps the images of two same-element atoms while that lowers the cost (at most
     * {@link #MAX_PASSES} passes); a carbon swap is kept only when {@code allowed} still accepts
     * the map. Returns the cost afterwards.
     */
    private int polishWithin(int[] map, int[] inv, int cost, java.util.function.Predicate<int[]> allowed) {
        for (int pass = 0; pass < MAX_PASSES; pass++) {
            boolean better = false;
            for (int a = 0; a < r.n; a++) {
                if (pin[a] >= 0) {
                    continue;
                }
                for (int b = a + 1; b < r.n; b++) {
                    if (pin[b] >= 0 || r.elementId[a] != r.elementId[b]) {
                        continue;
                    }
                    int before = local(map, inv, a, b) + local(map, inv, b, a) + edit(map, a, b);
                    swap(map, inv, a, b);
                    int after = local(map, inv, a, b) + local(map, inv, b, a) + edit(map, a, b);
                    if (after < before && (!r.element[a].equals("C") || allowed.test(map))) {
                        cost -= before - after;
                        better = true;
                    } else {
                        swap(map, inv, a, b);
                    }
                }
            }
            if (!better) {
                break;
            }
        }
        return cost;
    }

    private static void swap(int[] map, int[] inv, int a, int b) {
        int xa = map[a];
        int xb = map[b];
        map[a] = xb;
        map[b] = xa;
        inv[xb] = a;
        inv[xa] = b;
    }

    /** Cost of all pairs (u, v) with v != skip. */
    private int local(int[] map, int[] inv, int u, int skip) {
        int total = 0;
        int x = map[u];
        for (int v : r.nbr[u]) {
            if (v != skip) {
                total += edit(map, u, v);
            }
        }
        for (int y : p.nbr[x]) {
            int v = inv[y];
            if (v != skip && r.bond[u][v] == 0) {
                total += options.bondWeight(p.element[x], p.element[y]);
            }
        }
        return total;
    }

    private int edit(int[] map, int u, int v) {
        int before = r.bond[u][v];
        int after = p.bond[map[u]][map[v]];
        if (before == after) {
            return 0;
        }
        if (before == 0 || after == 0) {
            return options.bondWeight(r.element[u], r.element[v]);
        }
        return options.orderChangeWeight();
    }
}
