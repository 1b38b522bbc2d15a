package io.github.atomledger.atommapper.structure.internal;

import io.github.atomledger.atommapper.structure.StructureException;
import java.io.IOException;
import java.io.StringReader;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.openscience.cdk.aromaticity.Kekulization;
import org.openscience.cdk.exception.CDKException;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;
import org.openscience.cdk.io.IChemObjectReader;
import org.openscience.cdk.io.MDLV2000Reader;
import org.openscience.cdk.io.MDLV3000Reader;
import org.openscience.cdk.silent.SilentChemObjectBuilder;

/**
 * Reads one MDL molfile (CTfile connection table, V2000 or V3000) into a CDK container. The
 * layout is checked first, so that a broken file is refused with the line that breaks it (CDK's
 * readers say what but rarely where, and in relaxed mode accept a short atom block); then CDK
 * reads it (the reference reader). The V2000 layout: three header lines, a counts line with the
 * atom and bond counts in columns 1-3 and 4-6 and the version in columns 34-39, one line per
 * atom (x, y, z in columns 1-30, the symbol from column 32), one line per bond (the two atom
 * numbers in columns 1-3 and 4-6, the type in 7-9), properties, {@code M  END}. V3000 puts the
 * same in {@code M  V30} lines between {@code BEGIN CTAB} and {@code END CTAB} (BIOVIA "CTfile
 * Formats", from memory for the edition).
 *
 * <p>Aromatic bonds (type 4) are given Kekulé orders when CDK can assign them, so that implicit
 * hydrogens follow the valence model; atom-atom mapping numbers (V2000 columns 61-63, V3000
 * {@code AAMAP}) stay on the atoms as CDK's map index.
 */
public final class MolfileReader {

    private MolfileReader() {
    }

    /**
     * @param text the molfile; line 1 is its name line
     * @throws StructureException naming the line (1-based within {@code text}) of a layout error,
     *     or CDK's reason when its reader refuses the file
     */
    public static IAtomContainer read(String text) throws StructureException {
        List<String> lines = text.lines().toList();
        if (lines.size() < 4) {
            throw new StructureException("molfile ends after " + lines.size()
                    + " line(s): a header of three lines and a counts line are needed", lines.size(), null);
        }
        String counts = lines.get(3);
        boolean v3000 = counts.toUpperCase(Locale.ROOT).contains("V3000");
        if (v3000) {
            checkV3000(lines);
        } else {
            checkV2000(lines);
        }
        IAtomContainer mol;
        try {
            IAtomContainer empty = SilentChemObjectBuilder.getInstance().newAtomContainer();
            if (v3000) {
                try (MDLV3000Reader reader = new MDLV3000Reader(new StringReader(text))) {
                    mol = reader.read(empty);
                }
            } else {
                try (MDLV2000Reader reader = new MDLV2000Reader(new StringReader(text), IChemObjectReader.Mode.RELAXED)) {
                    mol = reader.read(empty);
                }
            }
        } catch (CDKException | IOException | RuntimeException e) {
            throw new StructureException("molfile not readable: " + firstLine(e), 0, e);
        }
        if (mol == null || mol.getAtomCount() == 0) {
            throw new StructureException("molfile has no atoms", 4, null);
        }
        kekulise(mol);
        return mol;
    }

    private static void kekulise(IAtomContainer mol) {
        boolean unset = false;
        for (IBond b : mol.bonds()) {
            if (b.getOrder() == null || b.getOrder() == IBond.Order.UNSET) {
                unset = true;
                break;
            }
        }
        if (!unset) {
            return;
        }
        // CDK's reader leaves the hydrogens of atoms on aromatic (type 4) bonds unset; count an
        // aromatic bond as 1.5 (common practice for the query bond), so benzene's carbons get one
        // hydrogen and pyridine's nitrogen none. A pyrrole-type nitrogen needs its H drawn.
        for (IAtom a : mol.atoms()) {
            if (a.getImplicitHydrogenCount() == null) {
                a.setImplicitHydrogenCount(impliedHydrogens(mol, a));
            }
        }
        try {
            Kekulization.kekulize(mol);
        } catch (CDKException e) {
            // An aromatic system with no Kekulé form keeps its aromatic bonds; the graph codes
            // them as aromatic either way (GraphBuilder).
        }
    }

    private static int impliedHydrogens(IAtomContainer mol, IAtom a) {
        double sum = 0;
        for (IBond b : mol.getConnectedBondsList(a)) {
            IBond.Order o = b.getOrder();
            sum += o == null || o == IBond.Order.UNSET ? 1.5 : o.numeric();
        }
        int charge = a.getFormalCharge() == null ? 0 : a.getFormalCharge();
        int valence = switch (a.getSymbol()) {
            case "C", "Si" -> 4 - Math.abs(charge);
            case "N", "P", "As" -> 3 + charge;
            case "O", "S", "Se" -> 2 + charge;
            case "B" -> 3 - Math.abs(charge);
            default -> 0;
        };
        return Math.max(0, valence - (int) Math.ceil(sum - 1e-9));
    }

    private static void checkV2000(List<String> lines) throws StructureException {
        String counts = lines.get(3);
        int atoms = number(counts, 0, 3, "atom count of the counts line", 4);
        int bonds = number(counts, 3, 6, "bond count of the counts line", 4);
        if (atoms < 0 || bonds < 0) {
            throw new StructureException("the counts line announces " + atoms + " atom(s) and " + bonds
                    + " bond(s); counts cannot be negative", 4, null);
        }
        int needed = 4 + atoms + bonds;
        if (lines.size() < needed) {
            throw new StructureException("molfile ends at line " + lines.size() + " but its counts line announces "
                    + atoms + " atom(s) and " + bonds + " bond(s)", lines.size(), null);
        }
        for (int i = 0; i < atoms; i++) {
            String l = lines.get(4 + i);
            int lineNo = 5 + i;
            if (!fixedColumnAtom(l) && !tokenAtom(l)) {
                throw new StructureException("atom line " + (i + 1) + " needs x, y, z and an element symbol: '"
                        + shorten(l) + "'", lineNo, null);
            }
        }
        for (int i = 0; i < bonds; i++) {
            String l = lines.get(4 + atoms + i);
            int lineNo = 5 + atoms + i;
            int a = number(l, 0, 3, "first atom of bond " + (i + 1), lineNo);
            int b = number(l, 3, 6, "second atom of bond " + (i + 1), lineNo);
            int type = number(l, 6, 9, "type of bond " + (i + 1), lineNo);
            if (a < 1 || a > atoms || b < 1 || b > atoms || a == b) {
                throw new StructureException("bond " + (i + 1) + " joins atoms " + a + " and " + b + " of " + atoms,
                        lineNo, null);
            }
            if (type < 1 || type > 8) {
                throw new StructureException("bond " + (i + 1) + " has type " + type + " (1 to 8 are defined)", lineNo, null);
            }
        }
        requireEnd(lines, needed);
    }

    private static void checkV3000(List<String> lines) throws StructureException {
        int atoms = -1;
        int bonds = -1;
        int i = 4;
        String section = "";
        int atomLines = 0;
        int bondLines = 0;
        Set<String> atomIds = new HashSet<>();
        boolean ctab = false;
        for (; i < lines.size(); i++) {
            String l = lines.get(i);
            if (l.startsWith("M  END")) {
                break;
            }
            if (!l.startsWith("M  V30 ")) {
                continue;
            }
            StringBuilder body = new StringBuilder(l.substring(7).strip());
            int first = i;
            while (body.length() > 0 && body.charAt(body.length() - 1) == '-' && i + 1 < lines.size()) {
                body.setLength(body.length() - 1);
                String next = lines.get(++i);
                body.append(next.startsWith("M  V30 ") ? next.substring(7) : next);
            }
            String[] t = body.toString().strip().split("\\s+");
            String head = t[0].toUpperCase(Locale.ROOT);
            if (head.equals("BEGIN") && t.length > 1) {
                section = t[1].toUpperCase(Locale.ROOT);
                ctab |= section.equals("CTAB");
            } else if (head.equals("END") && t.length > 1) {
                String closed = t[1].toUpperCase(Locale.ROOT);
                if (closed.equals("ATOM") && atomLines != atoms) {
                    throw new StructureException("the atom block has " + atomLines + " line(s) but COUNTS announces "
                            + atoms, first + 1, null);
                }
                if (closed.equals("BOND") && bondLines != bonds) {
                    throw new StructureException("the bond block has " + bondLines + " line(s) but COUNTS announces "
                            + bonds, first + 1, null);
                }
                section = closed.equals("CTAB") ? "" : "CTAB";
            } else if (head.equals("COUNTS")) {
                if (t.length < 3 || !isInteger(t[1]) || !isInteger(t[2])) {
                    throw new StructureException("COUNTS needs the atom and bond counts", first + 1, null);
                }
                atoms = Integer.parseInt(t[1]);
                bonds = Integer.parseInt(t[2]);
                if (atoms < 0 || bonds < 0) {
                    throw new StructureException("COUNTS announces " + atoms + " atom(s) and " + bonds
                            + " bond(s); counts cannot be negative", first + 1, null);
                }
            } else if (section.equals("ATOM")) {
                if (t.length < 5 || !isInteger(t[0]) || !isNumber(t[2]) || !isNumber(t[3]) || !isNumber(t[4])) {
                    throw new StructureException("atom line needs an index, a type and x, y, z: '" + shorten(l) + "'",
                            first + 1, null);
                }
                atomIds.add(t[0]);
                atomLines++;
            } else if (section.equals("BOND")) {
                if (t.length < 4 || !isInteger(t[1])) {
                    throw new StructureException("bond line needs an index, a type and two atoms: '" + shorten(l) + "'",
                            first + 1, null);
                }
                if (!atomIds.contains(t[2]) || !atomIds.contains(t[3]) || t[2].equals(t[3])) {
                    throw new StructureException("bond " + t[0] + " joins atoms " + t[2] + " and " + t[3]
                            + ", which the atom block does not define", first + 1, null);
                }
                bondLines++;
            }
        }
        if (!ctab || atoms < 0) {
            throw new StructureException("V3000 molfile without a connection table (BEGIN CTAB and COUNTS)", 4, null);
        }
        if (i >= lines.size()) {
            throw new StructureException("molfile has no 'M  END' line", lines.size(), null);
        }
    }

    /** x, y, z in columns 1-10, 11-20, 21-30 and a symbol from column 32, as the standard lays them out. */
    private static boolean fixedColumnAtom(String l) {
        return l.length() >= 32 && isNumber(l.substring(0, 10).strip()) && isNumber(l.substring(10, 20).strip())
                && isNumber(l.substring(20, 30).strip()) && !l.substring(31, Math.min(34, l.length())).isBlank();
    }

    /** The same fields separated by white space, as some writers leave them. */
    private static boolean tokenAtom(String l) {
        String[] t = l.strip().split("\\s+");
        return t.length >= 4 && isNumber(t[0]) && isNumber(t[1]) && isNumber(t[2])
                && (Character.isLetter(t[3].charAt(0)) || t[3].charAt(0) == '*');
    }

    private static void requireEnd(List<String> lines, int from) throws StructureException {
        for (int i = from; i < lines.size(); i++) {
            if (lines.get(i).startsWith("M  END")) {
                return;
            }
        }
        throw new StructureException("molfile has no 'M  END' line", lines.size(), null);
    }

    private static int number(String line, int from, int to, String what, int lineNo) throws StructureException {
        String field = line.length() <= from ? "" : line.substring(from, Math.min(to, line.length())).strip();
        if (!isInteger(field)) {
            throw new StructureException("the " + what + " (columns " + (from + 1) + "-" + to + ") is '" + field
                    + "', not a number", lineNo, null);
        }
        return Integer.parseInt(field);
    }

    private static boolean isInteger(String s) {
        if (s.isEmpty() || s.length() > 6) {
            return false;
        }
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (!(Character.isDigit(c) || (i == 0 && c == '-'))) {
                return false;
            }
        }
        return !s.equals("-");
    }

    private static boolean isNumber(String s) {
        try {
            Double.parseDouble(s);
            return !s.isEmpty();
        } catch (NumberFormatException e) {
            return false;
        }
    }

    private static String shorten(String s) {
        return s.length() > 60 ? s.substring(0, 57) + "..." : s;
    }

    private static String firstLine(Exception e) {
        String m = String.valueOf(e.getMessage()).strip();
        int nl = m.indexOf('\n');
        return nl < 0 ? m : m.substring(0, nl).strip();
    }
}
