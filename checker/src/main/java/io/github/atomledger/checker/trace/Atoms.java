package io.github.atomledger.checker.trace;

import io.github.atomledger.atommapper.structure.MoleculeGraph;
import io.github.atomledger.checker.check.structure.SpeciesStructures;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Labels and symmetry classes of species atoms, from the resolved structures; per-species results
 * are kept. Not thread-safe: one per traced model.
 */
final class Atoms {

    private final SpeciesStructures structures;
    private final Map<String, int[]> orbits = new HashMap<>();

    Atoms(SpeciesStructures structures) {
        this.structures = structures;
    }

    SpeciesStructures structures() {
        return structures;
    }

    String label(Position p) {
        return structures.label(p.species(), p.atom());
    }

    /** Orbit of each atom (0-based array, values 1-based representatives); null without a structure. */
    private int[] orbits(String species) {
        return orbits.computeIfAbsent(species, s -> structures.get(s).map(r -> {
            MoleculeGraph g = r.structure().graph();
            int[] o = new int[g.atomCount()];
            for (int i = 0; i < o.length; i++) {
                o[i] = g.orbit(i) + 1;
            }
            return o;
        }).orElse(null));
    }

    /** The atom's symmetry class: the smallest atom index of its orbit (the atom itself without a structure). */
    int orbit(Position p) {
        int[] o = orbits(p.species());
        return o == null || p.atom() > o.length ? p.atom() : o[p.atom() - 1];
    }

    /** Every atom of the species equivalent to {@code p} by the structure's symmetry, {@code p} included. */
    List<Position> orbitOf(Position p) {
        int[] o = orbits(p.species());
        if (o == null || p.atom() > o.length) {
            return List.of(p);
        }
        int rep = o[p.atom() - 1];
        List<Position> out = new ArrayList<>();
        for (int i = 0; i < o.length; i++) {
            if (o[i] == rep) {
                out.add(new Position(p.species(), i + 1));
            }
        }
        return out;
    }

    /** Number of distinct (species, symmetry class) among the positions. */
    int classes(Collection<Position> ps) {
        return (int) ps.stream().map(p -> p.species() + "\u0000" + orbit(p)).distinct().count();
    }

    /** Heavy-atom indices of the carbons of a species, ascending; empty without a structure. */
    List<Integer> carbons(String species) {
        List<Integer> out = new ArrayList<>();
        structures.get(species).ifPresent(r -> {
            MoleculeGraph g = r.structure().graph();
            for (int i = 0; i < g.atomCount(); i++) {
                if (g.element(i).equals("C")) {
                    out.add(i + 1);
                }
            }
        });
        return out;
    }

    /** The species' heavy-atom count, 0 without a structure. */
    int atomCount(String species) {
        return structures.get(species).map(r -> r.structure().heavyAtomCount()).orElse(0);
    }

    /** Positions as people read them; see {@link PositionText#of}. */
    String text(Collection<Position> ps) {
        return PositionText.of(structures, ps);
    }
}
