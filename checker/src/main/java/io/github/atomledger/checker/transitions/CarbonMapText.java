package io.github.atomledger.checker.transitions;

import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.mapping.AtomTransition;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * The compact text form of carbon transitions written into annotations: one line per pair of
 * molecules, the source atoms and the target atoms in parallel, for example
 * <pre>
 * accoa_c: 1 2 = cit_c: 5 4
 * oaa_c: 1 2 3 4 = cit_c: 6 3 2 1
 * </pre>
 * reads "carbon 1 of acetyl-CoA becomes carbon 5 of citrate, carbon 2 becomes carbon 4". A second
 * copy of a species is written {@code atp_c#2}. Atom numbers are the 1-based positions among the
 * structure's non-hydrogen atoms (the atom-mapper's convention). Lines are sorted by source and
 * target; within a line, pairs are sorted by source atom. SBML ids cannot contain ':', '#' or
 * '=', so the form is unambiguous.
 */
public final class CarbonMapText {

    private CarbonMapText() {
    }

    /** Formats carbon transitions, one line each, without indentation or trailing newline. */
    public static List<String> format(List<AtomTransition> transitions) {
        return format(transitions, (species, atom) -> Integer.toString(atom));
    }

    /**
     * Formats carbon transitions for people, as {@link #format(List)} does but naming each atom
     * with {@code names} (species id, 1-based atom index; usually the structure's readable label,
     * "C3"). Stored annotations keep the indices ({@link #format(List)}); this form is not parsed.
     */
    public static List<String> format(List<AtomTransition> transitions,
                                      java.util.function.BiFunction<String, Integer, String> names) {
        Map<String, List<AtomTransition>> groups = new TreeMap<>();
        for (AtomTransition t : transitions) {
            groups.computeIfAbsent(ref(t.from()) + "\u0000" + ref(t.to()), k -> new ArrayList<>()).add(t);
        }
        List<String> lines = new ArrayList<>();
        for (List<AtomTransition> g : groups.values()) {
            List<AtomTransition> sorted = g.stream().sorted().toList();
            StringBuilder from = new StringBuilder(ref(sorted.get(0).from())).append(':');
            StringBuilder to = new StringBuilder(ref(sorted.get(0).to())).append(':');
            for (AtomTransition t : sorted) {
                from.append(' ').append(names.apply(t.from().species(), t.from().atom()));
                to.append(' ').append(names.apply(t.to().species(), t.to().atom()));
            }
            lines.add(from + " = " + to);
        }
        return lines;
    }

    private static String ref(AtomRef r) {
        return r.copy() == 1 ? r.species() : r.species() + "#" + r.copy();
    }

    /**
     * Parses the text form back into carbon transitions (element "C").
     *
     * @throws IllegalArgumentException naming the line and what is wrong
     */
    public static List<AtomTransition> parse(String text) {
        List<AtomTransition> out = new ArrayList<>();
        int lineNo = 0;
        for (String raw : text.split("\\R")) {
            lineNo++;
            String line = raw.strip();
            if (line.isEmpty()) {
                continue;
            }
            String[] sides = line.split("=", -1);
            if (sides.length != 2) {
                throw new IllegalArgumentException("line " + lineNo + " of the carbon map: expected 'a: atoms = b: atoms', got '" + line + "'");
            }
            Side from = side(sides[0], lineNo);
            Side to = side(sides[1], lineNo);
            if (from.atoms.size() != to.atoms.size()) {
                throw new IllegalArgumentException("line " + lineNo + " of the carbon map: " + from.atoms.size()
                        + " source atom(s) but " + to.atoms.size() + " target atom(s)");
            }
            for (int i = 0; i < from.atoms.size(); i++) {
                out.add(new AtomTransition(new AtomRef(from.species, from.copy, from.atoms.get(i)),
                        new AtomRef(to.species, to.copy, to.atoms.get(i)), "C"));
            }
        }
        return out.stream().sorted().toList();
    }

    private record Side(String species, int copy, List<Integer> atoms) {
    }

    private static Side side(String text, int lineNo) {
        int colon = text.indexOf(':');
        if (colon < 0) {
            throw new IllegalArgumentException("line " + lineNo + " of the carbon map: missing ':' after the species in '" + text.strip() + "'");
        }
        String head = text.substring(0, colon).strip();
        int copy = 1;
        int hash = head.indexOf('#');
        String species = head;
        try {
            if (hash >= 0) {
                species = head.substring(0, hash);
                copy = Integer.parseInt(head.substring(hash + 1));
            }
            List<Integer> atoms = new ArrayList<>();
            for (String a : text.substring(colon + 1).strip().split("\\s+")) {
                if (!a.isEmpty()) {
                    atoms.add(Integer.parseInt(a));
                }
            }
            if (species.isEmpty() || copy < 1 || atoms.isEmpty() || atoms.stream().anyMatch(a -> a < 1)) {
                throw new NumberFormatException("empty or non-positive");
            }
            return new Side(species, copy, atoms);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("line " + lineNo + " of the carbon map: bad species, copy or atom number in '"
                    + text.strip() + "'");
        }
    }
}
