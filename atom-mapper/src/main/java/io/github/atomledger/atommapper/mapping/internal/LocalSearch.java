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
                    if (after < before) {
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
