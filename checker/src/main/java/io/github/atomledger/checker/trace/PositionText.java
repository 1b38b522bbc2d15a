package io.github.atomledger.checker.trace;

import io.github.atomledger.checker.check.structure.SpeciesStructures;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SortedSet;
import java.util.TreeSet;

/** How reports write positions: species id and readable atom labels. */
public final class PositionText {

    private PositionText() {
    }

    /**
     * Positions as people read them: {@code akg_c:C4}, {@code fum_c:C1/C4}, {@code co2_c:C1 or
     * pyr_c:C1}; species in id order, labels by atom class, then atoms without one by index;
     * "nowhere" for none.
     */
    public static String of(SpeciesStructures structures, Collection<Position> positions) {
        Map<String, SortedSet<Integer>> bySpecies = new LinkedHashMap<>();
        for (Position p : new TreeSet<>(positions)) {
            bySpecies.computeIfAbsent(p.species(), k -> new TreeSet<>()).add(p.atom());
        }
        List<String> parts = new ArrayList<>();
        bySpecies.forEach((species, atoms) -> parts.add(species + ":" + String.join("/", labels(structures, species, atoms))));
        return parts.isEmpty() ? "nowhere" : String.join(" or ", parts);
    }

    /** The labels of some atoms of one species, by atom class, then atoms without one by index. */
    public static List<String> labels(SpeciesStructures structures, String species, Collection<Integer> atoms) {
        return atoms.stream().sorted(Comparator.comparingInt((Integer a) -> classOf(structures, species, a))
                .thenComparingInt(a -> a)).map(a -> structures.label(species, a)).toList();
    }

    /** The atom's class for ordering labels: its atom class, or after every class when it has none. */
    public static int classOf(SpeciesStructures structures, String species, int atom) {
        return structures.get(species).map(r -> {
            int c = atom <= r.structure().heavyAtomCount() ? r.structure().atomClass(atom) : 0;
            return c > 0 ? c : Integer.MAX_VALUE;
        }).orElse(Integer.MAX_VALUE);
    }
}
