package io.github.atomledger.atommapper.structure;

import io.github.atomledger.atommapper.formula.Formula;
import io.github.atomledger.atommapper.structure.internal.GraphBuilder;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Locale;
import java.util.Objects;
import java.util.SortedMap;
import java.util.TreeMap;
import org.openscience.cdk.exception.CDKException;
import org.openscience.cdk.exception.InvalidSmilesException;
import org.openscience.cdk.inchi.InChIGeneratorFactory;
import org.openscience.cdk.inchi.InChIToStructure;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IPseudoAtom;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmiFlavor;
import org.openscience.cdk.smiles.SmilesGenerator;
import org.openscience.cdk.smiles.SmilesParser;

/**
 * An immutable parsed molecule: its formula, net charge, canonical form and heavy-atom graph.
 *
 * <pre>{@code
 * Structure pyruvate = Structure.fromSmiles("CC(=O)C(=O)[O-]");
 * pyruvate.formula();        // C3H3O3
 * pyruvate.charge();         // -1
 * pyruvate.heavyAtomCount(); // 6
 * }</pre>
 *
 * <p>Atom identity: heavy atom {@code k} (1-based) is the k-th non-hydrogen atom in the order of
 * the input (SMILES string order; InChI's own numbering for {@link #fromInchi}; the atom block's
 * order for {@link #fromMolfile}). Explicit hydrogen
 * atoms in the input count as hydrogens of the formula, never as atoms of the graph. A {@code *}
 * atom is the pseudo-element "R". OpenSMILES atom classes ({@code [CH2:3]}) are read as the
 * curator's readable positions ({@link #atomLabel}: "C3"); they change nothing else (graph,
 * fingerprint, maps and mapped SMILES are the same with and without them; only texts that name
 * atoms, such as the mapper's stereo notes, use the labels).
 *
 * <p>Thread-safety: instances are immutable. The CDK container kept inside is never handed out
 * and is copied before any CDK call that could change it. Arguments must not be null
 * ({@link NullPointerException} otherwise).
 *
 * <p>Does not handle: stereo (kept in {@link #canonicalSmiles()} but ignored by the graph),
 * polymers with repeat units (a molfile's Sgroups are ignored), reaction SMILES.
 */
public final class Structure {

    private final String source;
    private final Formula formula;
    private final int charge;
    private final java.util.function.Supplier<String> canonicalSmiles;
    private final java.util.function.Supplier<String> fingerprint;
    private final MoleculeGraph graph;
    private final IAtomContainer master;
    private final int[] heavyToAtom;
    private final int[] atomClasses;
    private final String[] labels;

    private Structure(String source, IAtomContainer parsed, boolean fromSmiles) throws StructureException {
        this.source = source;
        this.master = parsed;
        GraphBuilder built = GraphBuilder.build(parsed, source);
        this.graph = new MoleculeGraph(built.elements(), built.neighbours(), built.bondCodes(),
                built.orbits(), built.hydrogens());
        this.heavyToAtom = built.heavyToAtom();
        this.canonicalSmiles = built.canonicalSmiles();
        this.fingerprint = new io.github.atomledger.atommapper.structure.internal.Lazy<>(
                () -> "sha256:" + sha256(canonicalSmiles.get()).substring(0, 16));
        SortedMap<String, Long> counts = new TreeMap<>();
        int q = 0;
        for (IAtom atom : parsed.atoms()) {
            String symbol = atom instanceof IPseudoAtom || atom.getAtomicNumber() == null
                    || atom.getAtomicNumber() == 0 ? "R" : atom.getSymbol();
            counts.merge(symbol, 1L, Long::sum);
            Integer h = atom.getImplicitHydrogenCount();
            if (h != null && h > 0) {
                counts.merge("H", (long) h, Long::sum);
            }
            q += atom.getFormalCharge() == null ? 0 : atom.getFormalCharge();
        }
        this.formula = Formula.of(counts);
        this.charge = q;
        this.atomClasses = new int[heavyToAtom.length];
        for (int k = 0; k < heavyToAtom.length; k++) {
            // CDK keeps an OpenSMILES atom class as the atom's map index; only SMILES can carry one.
            int c = fromSmiles ? parsed.getAtom(heavyToAtom[k]).getMapIdx() : 0;
            atomClasses[k] = Math.max(c, 0);
        }
        this.labels = AtomLabels.of(graph, atomClasses);
    }

    /**
     * Parses a SMILES string (OpenSMILES; aromatic input is kekulised by CDK).
     *
     * @throws StructureException when the text is empty or not valid SMILES, or when the symmetry
     *     of the molecule is too complex to analyse within a fixed number of steps (see
     *     {@link MoleculeGraph#orbit}); the message quotes the text
     */
    public static Structure fromSmiles(String smiles) throws StructureException {
        Objects.requireNonNull(smiles, "smiles");
        if (smiles.isBlank()) {
            throw new StructureException("invalid SMILES '" + smiles + "': empty");
        }
        try {
            SmilesParser parser = new SmilesParser(SilentChemObjectBuilder.getInstance());
            return new Structure(smiles, parser.parseSmiles(smiles), true);
        } catch (InvalidSmilesException e) {
            throw new StructureException("invalid SMILES '" + smiles + "': " + firstLine(e), e);
        }
    }

    /**
     * Parses a standard or non-standard InChI through CDK's InChI bindings (a native library).
     *
     * @throws StructureException when the InChI is not valid, when the native InChI library
     *     cannot be loaded on this machine (the message then says so), or when the symmetry of the
     *     molecule is too complex to analyse within a fixed number of steps
     */
    public static Structure fromInchi(String inchi) throws StructureException {
        Objects.requireNonNull(inchi, "inchi");
        InChIToStructure toStructure;
        try {
            toStructure = InChIGeneratorFactory.getInstance()
                    .getInChIToStructure(inchi, SilentChemObjectBuilder.getInstance());
        } catch (CDKException e) {
            throw new StructureException("invalid InChI '" + inchi + "': " + firstLine(e), e);
        } catch (LinkageError e) {
            throw new StructureException("cannot read InChI '" + inchi
                    + "': the native InChI library could not be loaded (" + e.getMessage() + ")", e);
        }
        String status = String.valueOf(toStructure.getStatus());
        if (status.equals("ERROR") || toStructure.getAtomContainer() == null
                || toStructure.getAtomContainer().getAtomCount() == 0) {
            throw new StructureException("invalid InChI '" + inchi + "': "
                    + String.valueOf(toStructure.getMessage()).toLowerCase(Locale.ROOT));
        }
        return new Structure(inchi, toStructure.getAtomContainer(), false);
    }

    /**
     * Reads an MDL molfile (V2000 or V3000). Heavy atom k is the k-th non-hydrogen atom of the
     * atom block; atom-atom mapping numbers in the file are kept ({@link #mapNumbers()}); query
     * and R-group atoms ({@code R#}, {@code *}, {@code A}, ...) become the pseudo-element "R".
     *
     * @param molfile the molfile text, from its name line to {@code M  END}
     * @throws StructureException for a broken layout (with {@link StructureException#line()}, 1-based
     *     in {@code molfile}), a file CDK's MDL readers refuse, or a symmetry too complex to analyse
     */
    public static Structure fromMolfile(String molfile) throws StructureException {
        Objects.requireNonNull(molfile, "molfile");
        IAtomContainer mol = io.github.atomledger.atommapper.structure.internal.MolfileReader.read(molfile);
        try {
            return new Structure(molfile, mol, false);
        } catch (StructureException e) {
            // The graph's messages quote the source text; a molfile is named by its first line instead.
            String name = molfile.lines().findFirst().orElse("").strip();
            throw new StructureException(String.valueOf(e.getMessage()).replace(molfile,
                    "molfile" + (name.isEmpty() ? "" : " " + name)), e);
        }
    }

    /**
     * The atom-atom mapping numbers the input carried, per heavy atom (index k-1 for heavy atom
     * k): the map column of a molfile, or the atom class of a SMILES atom; 0 where none.
     */
    public int[] mapNumbers() {
        int[] out = new int[heavyToAtom.length];
        for (int k = 0; k < out.length; k++) {
            out[k] = master.getAtom(heavyToAtom[k]).getMapIdx();
        }
        return out;
    }

    /**
     * This molecule as an MDL V2000 molfile (CDK's writer, with 2D coordinates from CDK's layout),
     * atoms in input order, heavy atom k carrying the atom-atom mapping number
     * {@code mapNumbers[k-1]} (0 for none). Explicit hydrogens of the input stay atoms of the
     * block, without numbers.
     *
     * @param name the first (name) line
     * @throws IllegalArgumentException when {@code mapNumbers.length != heavyAtomCount()}
     * @throws StructureException when CDK cannot write it (more than 999 atoms or bonds, for one)
     */
    public String toMolfile(String name, int[] mapNumbers) throws StructureException {
        if (mapNumbers.length != heavyToAtom.length) {
            throw new IllegalArgumentException("expected " + heavyToAtom.length + " map numbers, got "
                    + mapNumbers.length);
        }
        try {
            IAtomContainer copy = master.clone();
            for (IAtom atom : copy.atoms()) {
                atom.setMapIdx(0);
            }
            for (int k = 0; k < mapNumbers.length; k++) {
                copy.getAtom(heavyToAtom[k]).setMapIdx(Math.max(0, mapNumbers[k]));
            }
            copy.setTitle(name);
            try {
                new org.openscience.cdk.layout.StructureDiagramGenerator().generateCoordinates(copy);
            } catch (CDKException | RuntimeException e) {
                // Coordinates are for people; a molecule CDK cannot lay out keeps zeros.
            }
            java.io.StringWriter out = new java.io.StringWriter();
            try (org.openscience.cdk.io.MDLV2000Writer w = new org.openscience.cdk.io.MDLV2000Writer(out)) {
                w.write(copy);
            }
            return out.toString();
        } catch (CloneNotSupportedException | CDKException | java.io.IOException | RuntimeException e) {
            throw new StructureException("cannot write a molfile for " + name + ": " + firstLine(e), e);
        }
    }

    /** The text this structure was parsed from, unchanged. */
    public String source() {
        return source;
    }

    /** True when some heavy atom carries an OpenSMILES atom class. */
    public boolean hasAtomClasses() {
        for (int c : atomClasses) {
            if (c > 0) {
                return true;
            }
        }
        return false;
    }

    /**
     * The OpenSMILES atom class of heavy atom {@code atom} (1-based, as in the atom maps), 0 when
     * it has none. Atom classes are the curator's own numbering (for example biochemical
     * positions, {@code [CH2:3]} for C3); they never enter the graph, the fingerprint or a map.
     *
     * @throws IndexOutOfBoundsException when {@code atom} is not between 1 and {@link #heavyAtomCount()}
     */
    public int atomClass(int atom) {
        return atomClasses[atom - 1];
    }

    /**
     * The readable name of heavy atom {@code atom} (1-based): its element and atom class
     * ({@code "C3"} for {@code [CH2:3]}) when it has a class that no other heavy atom of this
     * structure shares with the same element; otherwise its heavy-atom index as text ({@code "7"}).
     * Reports name atoms this way.
     *
     * @throws IndexOutOfBoundsException when {@code atom} is not between 1 and {@link #heavyAtomCount()}
     */
    public String atomLabel(int atom) {
        return labels[atom - 1];
    }

    /**
     * Finds the heavy atom a reader names: a label as {@link #atomLabel} gives it ({@code "C3"})
     * or a heavy-atom index ({@code "7"}). Returns 0 when no atom has that name.
     */
    public int atomNamed(String name) {
        String n = name.strip();
        for (int k = 0; k < labels.length; k++) {
            if (labels[k].equals(n)) {
                return k + 1;
            }
        }
        if (!n.isEmpty() && n.chars().allMatch(Character::isDigit) && n.length() < 7) {
            int k = Integer.parseInt(n);
            return k >= 1 && k <= labels.length ? k : 0;
        }
        return 0;
    }

    /**
     * True when {@code other} numbers its heavy atoms as this structure does: under the identity
     * numbering the two graphs have the same elements, bonds and hydrogen counts. Two SMILES that
     * differ only in atom classes, brackets or stereo marks are numbered alike; the same molecule
     * written from another starting atom is not.
     */
    public boolean numberedAlike(Structure other) {
        MoleculeGraph a = graph;
        MoleculeGraph b = other.graph;
        if (a.atomCount() != b.atomCount()) {
            return false;
        }
        for (int i = 0; i < a.atomCount(); i++) {
            if (!a.element(i).equals(b.element(i)) || a.hydrogens(i) != b.hydrogens(i)
                    || !java.util.Arrays.equals(a.neighbours(i), b.neighbours(i))
                    || !java.util.Arrays.equals(a.bondCodes(i), b.bondCodes(i))) {
                return false;
            }
        }
        return true;
    }

    /** The full formula including implicit and explicit hydrogens; "R" for wildcard atoms. */
    public Formula formula() {
        return formula;
    }

    /** The net formal charge (sum of atom charges). */
    public int charge() {
        return charge;
    }

    /** The number of non-hydrogen atoms (pseudo atoms included). */
    public int heavyAtomCount() {
        return graph.atomCount();
    }

    /** CDK's canonical SMILES with aromatic symbols, stereo and charges: equal for equal molecules. */
    public String canonicalSmiles() {
        return canonicalSmiles.get();
    }

    /** "sha256:" plus the first 16 hex digits of the SHA-256 of {@link #canonicalSmiles()}. */
    public String fingerprint() {
        return fingerprint.get();
    }

    /** The heavy-atom graph the atom mapper works on. */
    public MoleculeGraph graph() {
        return graph;
    }

    /**
     * This molecule as SMILES in input atom order, with heavy atom k (0-based) carrying the
     * OpenSMILES atom class {@code classes[k]} when it is positive.
     *
     * @throws IllegalArgumentException when {@code classes.length != heavyAtomCount()}
     */
    public String smilesWithAtomClasses(int[] classes) {
        if (classes.length != heavyToAtom.length) {
            throw new IllegalArgumentException("expected " + heavyToAtom.length + " classes, got "
                    + classes.length);
        }
        try {
            IAtomContainer copy = master.clone();
            for (IAtom atom : copy.atoms()) {
                atom.setMapIdx(0);
            }
            for (int k = 0; k < classes.length; k++) {
                if (classes[k] > 0) {
                    copy.getAtom(heavyToAtom[k]).setMapIdx(classes[k]);
                }
            }
            return new SmilesGenerator(SmiFlavor.AtomAtomMap | SmiFlavor.Stereo).create(copy);
        } catch (CloneNotSupportedException | CDKException e) {
            throw new IllegalStateException("cannot write SMILES for " + source, e);
        }
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Structure s && s.source.equals(source);
    }

    @Override
    public int hashCode() {
        return source.hashCode();
    }

    @Override
    public String toString() {
        return source;
    }

    private static String firstLine(Exception e) {
        String m = String.valueOf(e.getMessage()).strip();
        int nl = m.indexOf('\n');
        String line = nl < 0 ? m : m.substring(0, nl).strip();
        // CDK repeats the input ("could not parse 'C1CC', ..."); the caller quotes it already.
        if (line.startsWith("could not parse '")) {
            int comma = line.indexOf("', ");
            line = comma < 0 ? line : line.substring(comma + 3);
        }
        while (line.endsWith(":") || line.endsWith(".")) {
            line = line.substring(0, line.length() - 1).strip();
        }
        return line.isEmpty() ? line : Character.toLowerCase(line.charAt(0)) + line.substring(1);
    }

    private static String sha256(String text) {
        try {
            MessageDigest digest = MessageDigest.getInstance("SHA-256");
            return HexFormat.of().formatHex(digest.digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is missing from this JDK", e);
        }
    }
}
