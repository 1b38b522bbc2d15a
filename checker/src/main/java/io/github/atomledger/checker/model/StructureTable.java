package io.github.atomledger.checker.model;

import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.atommapper.structure.StructureException;
import io.github.atomledger.checker.AtomLedgerException;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;

/**
 * The structure side table ({@code atomledger.structures}): a UTF-8, tab-separated file whose
 * first line is a header naming the columns {@code species} and {@code smiles} or {@code inchi}
 * (both may be present; other columns are ignored; names are case-insensitive). Each further
 * line gives one species' structure. Blank lines and lines starting with {@code #} are skipped;
 * a row with an empty structure cell gives the species no structure.
 *
 * <pre>{@code
 * species	smiles
 * M_pyr_c	CC(=O)C(=O)[O-]
 * }</pre>
 *
 * <p>Example: {@code Map<String, StructureTable.Entry> s = StructureTable.load(Path.of("structures.tsv"));}
 * then {@code s.get("M_pyr_c").parse()}. The result keeps file order and is unmodifiable.
 * Chemistry (parsing the SMILES or InChI) is done by atom-mapper's {@link Structure}, on demand.
 *
 * @see #load(Path, String)
 */
public final class StructureTable {

    /** The notation of a structure text. */
    public enum Kind {
        SMILES, INCHI
    }

    /**
     * One row.
     *
     * @param species the species id as written
     * @param text    the SMILES or InChI text, stripped
     * @param kind    its notation
     * @param line    1-based line in the table file
     */
    public record Entry(String species, String text, Kind kind, int line) {

        public Entry {
            Objects.requireNonNull(species, "species");
            Objects.requireNonNull(text, "text");
            Objects.requireNonNull(kind, "kind");
        }

        /** Parses the text with atom-mapper (CDK). */
        public Structure parse() throws StructureException {
            return kind == Kind.SMILES ? Structure.fromSmiles(text) : Structure.fromInchi(text);
        }
    }

    private StructureTable() {
    }

    /** {@link #load(Path, String)} with the file name as written in messages. */
    public static Map<String, Entry> load(Path file) {
        return load(file, file.toString().replace('\\', '/'));
    }

    /**
     * Reads the table.
     *
     * @param displayPath how messages name the file
     * @return species id to entry, in file order, unmodifiable
     * @throws AtomLedgerException naming the file and line for a missing file, a bad header, a
     *         row with too few columns, an empty species id, a duplicated species or bad UTF-8
     */
    public static Map<String, Entry> load(Path file, String displayPath) {
        Map<String, Entry> out = new LinkedHashMap<>();
        try (BufferedReader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            String header = in.readLine();
            if (header == null) {
                throw new AtomLedgerException(displayPath + ":1: the structure table is empty; expected a header line"
                        + " with the columns 'species' and 'smiles' or 'inchi'");
            }
            List<String> names = List.of(stripBom(header).split("\t", -1));
            int speciesCol = column(names, "species");
            int smilesCol = column(names, "smiles");
            int inchiCol = column(names, "inchi");
            if (speciesCol < 0 || (smilesCol < 0 && inchiCol < 0)) {
                throw new AtomLedgerException(displayPath + ":1: the header must name the tab-separated columns"
                        + " 'species' and 'smiles' or 'inchi'; found " + names);
            }
            int needed = Math.max(speciesCol, Math.max(smilesCol, inchiCol)) + 1;
            String line;
            int number = 1;
            while ((line = in.readLine()) != null) {
                number++;
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] cells = line.split("\t", -1);
                if (cells.length < Math.max(speciesCol, smilesCol < 0 ? inchiCol : smilesCol) + 1) {
                    throw new AtomLedgerException(displayPath + ":" + number + ": expected " + needed
                            + " tab-separated columns, found " + cells.length);
                }
                String species = cells[speciesCol].strip();
                if (species.isEmpty()) {
                    throw new AtomLedgerException(displayPath + ":" + number + ": the species column is empty");
                }
                String smiles = cell(cells, smilesCol);
                String inchi = cell(cells, inchiCol);
                Entry entry = !smiles.isEmpty() ? new Entry(species, smiles, Kind.SMILES, number)
                        : !inchi.isEmpty() ? new Entry(species, inchi, Kind.INCHI, number) : null;
                Entry before = out.get(species);
                if (before != null) {
                    throw new AtomLedgerException(displayPath + ":" + number + ": species '" + species
                            + "' is listed twice (first on line " + before.line() + ")");
                }
                if (entry != null) {
                    out.put(species, entry);
                }
            }
        } catch (NoSuchFileException e) {
            throw new AtomLedgerException(displayPath + ": structure table not found", e);
        } catch (CharacterCodingException e) {
            throw new AtomLedgerException(displayPath + ": the structure table is not UTF-8 text", e);
        } catch (IOException e) {
            throw new AtomLedgerException(displayPath + ": cannot read the structure table: " + e.getMessage(), e);
        }
        return Collections.unmodifiableMap(out);
    }

    private static String stripBom(String s) {
        return s.startsWith("\uFEFF") ? s.substring(1) : s;
    }

    private static int column(List<String> names, String wanted) {
        for (int i = 0; i < names.size(); i++) {
            if (names.get(i).strip().toLowerCase(Locale.ROOT).equals(wanted)) {
                return i;
            }
        }
        return -1;
    }

    private static String cell(String[] cells, int col) {
        return col >= 0 && col < cells.length ? cells[col].strip() : "";
    }
}
