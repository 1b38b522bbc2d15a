package io.github.atomledger.atommapper.ctfile;

import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.atommapper.structure.StructureException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;

/**
 * An MDL RXN file (CTfile standard, V2000 or V3000): reactant and product molecules, each with
 * the atom-atom mapping numbers written on its atoms. Atoms with the same positive number on the
 * two sides are the same atom before and after the reaction.
 *
 * <pre>{@code
 * RxnFile rxn = RxnFile.parse(Files.readString(path));
 * for (RxnFile.Molecule m : rxn.reactants()) {
 *     int[] numbers = m.structure().mapNumbers(); // per heavy atom, 0 = unmapped
 * }
 * String text = RxnFile.write("PGI", "origin=inferred", reactants, products);
 * }</pre>
 *
 * <p>Layout (BIOVIA "CTfile Formats", from memory for the edition): V2000 is {@code $RXN}, a
 * name line, a program line, a comment line, a counts line (reactants in columns 1-3, products in
 * 4-6, agents in 7-9), then one {@code $MOL} line plus a V2000 molfile per molecule. V3000 is
 * {@code $RXN V3000}, the same three lines, {@code M  V30 COUNTS r p}, and connection tables
 * inside {@code BEGIN REACTANT}/{@code END REACTANT} and {@code BEGIN PRODUCT}/{@code END PRODUCT}.
 * Agents are read past. Writing gives V2000 (CDK's molfile writer for each molecule), with the
 * program line fixed so that the same maps give the same bytes.
 *
 * @param name      the name line
 * @param comment   the comment line
 * @param reactants reactant molecules in file order
 * @param products  product molecules in file order
 */
public record RxnFile(String name, String comment, List<Molecule> reactants, List<Molecule> products) {

    /** The program line written into every header: initials blank, program name, no date. */
    static final String PROGRAM_LINE = "  AtomLdgr          2D";

    /**
     * One molecule of the file.
     *
     * @param structure the molecule; {@link Structure#mapNumbers()} gives its atom-atom mapping numbers
     * @param line      1-based line of the file where its molfile or connection table starts
     */
    public record Molecule(Structure structure, int line) {
        public Molecule {
            Objects.requireNonNull(structure, "structure");
        }
    }

    /**
     * A molecule to write: its structure and, per heavy atom, the mapping number (0 for none).
     *
     * @param name the molfile's name line (a species id, for one)
     */
    public record Part(String name, Structure structure, int[] mapNumbers) {
        public Part {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(structure, "structure");
            mapNumbers = mapNumbers.clone();
        }
    }

    public RxnFile {
        name = name == null ? "" : name;
        comment = comment == null ? "" : comment;
        reactants = List.copyOf(reactants);
        products = List.copyOf(products);
    }

    /**
     * Reads an RXN file.
     *
     * @throws StructureException naming the line (1-based in {@code text}, {@link StructureException#line()})
     *     of the first problem: a missing {@code $RXN} line, a bad counts line, a molecule missing
     *     or unreadable
     */
    public static RxnFile parse(String text) throws StructureException {
        List<String> lines = text.replace("\uFEFF", "").lines().toList();
        if (lines.isEmpty() || !lines.get(0).startsWith("$RXN")) {
            throw new StructureException("an RXN file starts with a '$RXN' line", 1, null);
        }
        if (lines.size() < 5) {
            throw new StructureException("an RXN file needs three header lines and a counts line", lines.size(), null);
        }
        boolean v3000 = lines.get(0).toUpperCase(Locale.ROOT).contains("V3000");
        return v3000 ? parseV3000(lines) : parseV2000(lines);
    }

    private static RxnFile parseV2000(List<String> lines) throws StructureException {
        String counts = lines.get(4);
        int r = count(counts, 0, 3, "reactant count");
        int p = count(counts, 3, 6, "product count");
        int a = counts.strip().length() > 6 && counts.length() >= 9 ? count(counts, 6, 9, "agent count") : 0;
        List<Molecule> molecules = new ArrayList<>();
        int i = 5;
        for (int m = 0; m < r + p + a; m++) {
            while (i < lines.size() && lines.get(i).isBlank()) {
                i++;
            }
            if (i >= lines.size() || !lines.get(i).startsWith("$MOL")) {
                throw new StructureException("molecule " + (m + 1) + " of " + (r + p + a)
                        + " announced by the counts line should start with '$MOL'", Math.min(i + 1, lines.size()), null);
            }
            int start = i + 1;
            int end = start;
            while (end < lines.size() && !lines.get(end).startsWith("M  END") && !lines.get(end).startsWith("$MOL")) {
                end++;
            }
            if (end >= lines.size() || !lines.get(end).startsWith("M  END")) {
                throw new StructureException("molecule " + (m + 1) + " has no 'M  END' line", Math.min(end + 1, lines.size()), null);
            }
            molecules.add(molecule(String.join("\n", lines.subList(start, end + 1)) + "\n", start + 1, start));
            i = end + 1;
        }
        return new RxnFile(lines.get(1).strip(), lines.get(3).strip(), molecules.subList(0, r), molecules.subList(r, r + p));
    }

    private static RxnFile parseV3000(List<String> lines) throws StructureException {
        List<Molecule> reactants = new ArrayList<>();
        List<Molecule> products = new ArrayList<>();
        String block = "";
        int declaredR = -1;
        int declaredP = -1;
        for (int i = 4; i < lines.size(); i++) {
            String l = lines.get(i);
            String body = l.startsWith("M  V30 ") ? l.substring(7).strip().toUpperCase(Locale.ROOT) : "";
            if (body.startsWith("COUNTS")) {
                String[] t = body.split("\\s+");
                if (t.length < 3) {
                    throw new StructureException("COUNTS needs the reactant and product counts", i + 1, null);
                }
                declaredR = count(t[1], 0, t[1].length(), "reactant count", i + 1);
                declaredP = count(t[2], 0, t[2].length(), "product count", i + 1);
            } else if (body.startsWith("BEGIN REACTANT") || body.startsWith("BEGIN PRODUCT") || body.startsWith("BEGIN AGENT")) {
                block = body.substring(6).strip();
            } else if (body.startsWith("END REACTANT") || body.startsWith("END PRODUCT") || body.startsWith("END AGENT")) {
                block = "";
            } else if (body.startsWith("BEGIN CTAB")) {
                int end = i + 1;
                while (end < lines.size() && !(lines.get(end).startsWith("M  V30 ")
                        && lines.get(end).substring(7).strip().toUpperCase(Locale.ROOT).startsWith("END CTAB"))) {
                    end++;
                }
                if (end >= lines.size()) {
                    throw new StructureException("a connection table has no 'END CTAB'", i + 1, null);
                }
                // A molfile of four header lines around the table: its line 5 is line i+1 here.
                String molfile = "\n" + PROGRAM_LINE + "\n\n  0  0  0     0  0            999 V3000\n"
                        + String.join("\n", lines.subList(i, end + 1)) + "\nM  END\n";
                Molecule m = molecule(molfile, i + 1, i - 4);
                if (block.equals("REACTANT")) {
                    reactants.add(m);
                } else if (block.equals("PRODUCT")) {
                    products.add(m);
                }
                i = end;
            }
        }
        if (declaredR < 0) {
            throw new StructureException("a V3000 RXN file needs an 'M  V30 COUNTS' line", 5, null);
        }
        if (declaredR != reactants.size() || declaredP != products.size()) {
            throw new StructureException("COUNTS announces " + declaredR + " reactant(s) and " + declaredP
                    + " product(s) but the file has " + reactants.size() + " and " + products.size(), 5, null);
        }
        return new RxnFile(lines.get(1).strip(), lines.get(3).strip(), reactants, products);
    }

    /** {@code shift}: added to a line of the molfile gives the line of the RXN file. */
    private static Molecule molecule(String molfile, int start, int shift) throws StructureException {
        try {
            return new Molecule(Structure.fromMolfile(molfile), start);
        } catch (StructureException e) {
            int line = e.line() == 0 ? start : e.line() + shift;
            throw new StructureException("molecule at line " + start + ": " + e.getMessage(), line, e);
        }
    }

    private static int count(String line, int from, int to, String what) throws StructureException {
        return count(line, from, to, what, 5);
    }

    private static int count(String line, int from, int to, String what, int lineNo) throws StructureException {
        String field = line.length() <= from ? "" : line.substring(from, Math.min(to, line.length())).strip();
        try {
            int n = Integer.parseInt(field);
            if (n < 0 || n > 999) {
                throw new NumberFormatException();
            }
            return n;
        } catch (NumberFormatException e) {
            throw new StructureException("the " + what + " is '" + field + "', not a number from 0 to 999", lineNo, null);
        }
    }

    /**
     * Writes a V2000 RXN file. Deterministic: the same parts give the same text.
     *
     * @param name    the name line (a reaction id, for one)
     * @param comment the comment line (one line; longer text is cut at 80 characters)
     * @throws StructureException when a molecule cannot be written as a molfile
     */
    public static String write(String name, String comment, List<Part> reactants, List<Part> products)
            throws StructureException {
        StringBuilder out = new StringBuilder();
        out.append("$RXN\n").append(oneLine(name)).append('\n').append(PROGRAM_LINE).append('\n')
                .append(oneLine(comment)).append('\n')
                .append(String.format(Locale.ROOT, "%3d%3d", reactants.size(), products.size())).append('\n');
        for (List<Part> side : List.of(reactants, products)) {
            for (Part p : side) {
                String mol = p.structure().toMolfile(oneLine(p.name()), p.mapNumbers());
                List<String> lines = new ArrayList<>(mol.lines().toList());
                if (lines.size() > 1) {
                    lines.set(1, PROGRAM_LINE);
                }
                out.append("$MOL\n");
                lines.forEach(l -> out.append(l).append('\n'));
            }
        }
        return out.toString();
    }

    private static String oneLine(String s) {
        String one = s.replaceAll("[\\r\\n]+", " ");
        return one.length() > 80 ? one.substring(0, 80) : one;
    }
}
