package io.github.atomledger.checker.check.structure;

import io.github.atomledger.checker.AtomLedgerException;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The species structure side table: a UTF-8 TSV file with a header line and the columns
 * {@code species} and {@code smiles} or {@code inchi} (other columns are ignored; a row may leave
 * one of them empty, or both, which means no structure is known). Lines starting with {@code #} and blank lines are skipped.
 *
 * <p>Example:
 * <pre>
 * species	smiles
 * glc_c	OC[C@H]1OC(O)[C@H](O)[C@@H](O)[C@@H]1O
 * </pre>
 *
 * @throws AtomLedgerException from {@link #load} naming the file and line for a missing header
 *         column, a row without a species id, or a duplicate species
 */
public final class StructureTable {

    /** One row. {@code kind} is "smiles" or "inchi"; {@code line} is 1-based. */
    public record Entry(String species, String kind, String text, int line) {
    }

    private final String file;
    private final Map<String, Entry> entries;

    private StructureTable(String file, Map<String, Entry> entries) {
        this.file = file;
        this.entries = Collections.unmodifiableMap(entries);
    }

    /** An empty table. */
    public static StructureTable empty() {
        return new StructureTable("", new LinkedHashMap<>());
    }

    public static StructureTable load(Path path, String displayPath) {
        List<String> lines;
        try (BufferedReader in = new BufferedReader(new java.io.InputStreamReader(Files.newInputStream(path),
                StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)))) {
            lines = in.lines().toList();
        } catch (java.io.UncheckedIOException e) {
            if (e.getCause() instanceof CharacterCodingException) {
                throw new AtomLedgerException(displayPath + ": the structure table is not UTF-8 text", e);
            }
            throw new AtomLedgerException(displayPath + ": cannot read the structure table: " + e.getMessage(), e);
        } catch (java.nio.file.NoSuchFileException e) {
            throw new AtomLedgerException(displayPath + ": structure table not found", e);
        } catch (IOException e) {
            throw new AtomLedgerException(displayPath + ": cannot read the structure table: " + e.getMessage(), e);
        }
        int headerIndex = -1;
        for (int i = 0; i < lines.size(); i++) {
            String l = lines.get(i);
            if (!l.isBlank() && !l.startsWith("#")) {
                headerIndex = i;
                break;
            }
        }
        if (headerIndex < 0) {
            throw new AtomLedgerException(displayPath + ": the structure table is empty (expected a header line)");
        }
        String[] header = lines.get(headerIndex).replace("\uFEFF", "").split("\t", -1);
        int species = -1;
        int smiles = -1;
        int inchi = -1;
        for (int i = 0; i < header.length; i++) {
            switch (header[i].strip().toLowerCase(Locale.ROOT)) {
                case "species" -> species = i;
                case "smiles" -> smiles = i;
                case "inchi" -> inchi = i;
                default -> {
                }
            }
        }
        if (species < 0 || (smiles < 0 && inchi < 0)) {
            throw new AtomLedgerException(displayPath + ":" + (headerIndex + 1)
                    + ": the header needs a 'species' column and a 'smiles' or 'inchi' column (tab-separated), found: "
                    + String.join(", ", header));
        }
        Map<String, Entry> entries = new LinkedHashMap<>();
        for (int i = headerIndex + 1; i < lines.size(); i++) {
            String l = lines.get(i);
            if (l.isBlank() || l.startsWith("#")) {
                continue;
            }
            String[] cells = l.split("\t", -1);
            int lineNo = i + 1;
            String id = cell(cells, species);
            if (id.isEmpty()) {
                throw new AtomLedgerException(displayPath + ":" + lineNo + ": the row has no species id");
            }
            String s = cell(cells, smiles);
            String n = cell(cells, inchi);
            Entry e = !s.isEmpty() ? new Entry(id, "smiles", s, lineNo)
                    : !n.isEmpty() ? new Entry(id, "inchi", n, lineNo) : null;
            if (e == null) {
                // A row with empty structure cells says "no structure known", as spreadsheets export them.
                continue;
            }
            Entry previous = entries.putIfAbsent(id, e);
            if (previous != null) {
                throw new AtomLedgerException(displayPath + ":" + lineNo + ": species " + id
                        + " is listed twice (first at line " + previous.line() + ")");
            }
        }
        return new StructureTable(displayPath, entries);
    }

    private static String cell(String[] cells, int index) {
        return index >= 0 && index < cells.length ? cells[index].strip() : "";
    }

    /** The file as reports name it ("" for the empty table). */
    public String file() {
        return file;
    }

    /** Rows by species id, in file order. */
    public Map<String, Entry> entries() {
        return entries;
    }
}
