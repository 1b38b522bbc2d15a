package io.github.atomledger.checker.check.structure;

import io.github.atomledger.checker.AtomLedgerException;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * A structure table: a UTF-8 TSV file (plain or gzip) with a header line, one or more key
 * columns and a structure column. Key columns: {@code species} (the model's species ids) and the
 * identifiers.org prefixes of {@link CrossReference#PREFIXES} ({@code chebi},
 * {@code metanetx.chemical}, {@code kegg.compound}, {@code bigg.metabolite}, {@code inchikey}),
 * whose ids resolve every species whose MIRIAM annotation carries them, so one table can serve
 * all of a lab's models. Structure columns: {@code smiles} or {@code inchi} (SMILES wins when a
 * row has both). Other columns are ignored; a row may leave any cell empty (an empty structure
 * means "no structure known"). Lines starting with {@code #} and blank lines are skipped.
 *
 * <p>Example:
 * <pre>
 * species	chebi	smiles
 * glc_c		OC[C@H]1OC(O)[C@H](O)[C@@H](O)[C@@H]1O
 * 	CHEBI:15361	CC(=O)C([O-])=O
 * </pre>
 *
 * @throws AtomLedgerException from {@link #load} naming the file and line for a missing header
 *         column, a row without any key, an id not of its column's form, or a key listed twice
 */
public final class StructureTable implements StructureFile {

    /** One row. {@code kind} is "smiles" or "inchi"; {@code line} is 1-based; {@code species} is "" when the row has none. */
    public record Entry(String species, String kind, String text, int line) {
    }

    private final String file;
    private final Map<String, Entry> entries;
    private final Map<CrossReference, Entry> references;

    private StructureTable(String file, Map<String, Entry> entries, Map<CrossReference, Entry> references) {
        this.file = file;
        this.entries = Collections.unmodifiableMap(entries);
        this.references = Collections.unmodifiableMap(references);
    }

    /** An empty table. */
    public static StructureTable empty() {
        return new StructureTable("", new LinkedHashMap<>(), new LinkedHashMap<>());
    }

    public static StructureTable load(Path path, String displayPath) {
        List<String> lines;
        try (InputStream in = StructureFiles.open(path);
             BufferedReader reader = new BufferedReader(new InputStreamReader(in,
                     StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)))) {
            lines = reader.lines().toList();
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
        Map<String, Integer> keyColumns = new LinkedHashMap<>();
        for (int i = 0; i < header.length; i++) {
            String name = header[i].strip().toLowerCase(Locale.ROOT);
            switch (name) {
                case "species" -> species = i;
                case "smiles" -> smiles = i;
                case "inchi" -> inchi = i;
                default -> {
                    if (CrossReference.PREFIXES.contains(name)) {
                        keyColumns.put(name, i);
                    }
                }
            }
        }
        if ((species < 0 && keyColumns.isEmpty()) || (smiles < 0 && inchi < 0)) {
            throw new AtomLedgerException(displayPath + ":" + (headerIndex + 1)
                    + ": the header needs a 'species' column or a cross-reference column ("
                    + String.join(", ", CrossReference.PREFIXES) + ") and a 'smiles' or 'inchi' column (tab-separated), found: "
                    + String.join(", ", header));
        }
        Map<String, Entry> entries = new LinkedHashMap<>();
        Map<CrossReference, Entry> references = new LinkedHashMap<>();
        for (int i = headerIndex + 1; i < lines.size(); i++) {
            String l = lines.get(i);
            if (l.isBlank() || l.startsWith("#")) {
                continue;
            }
            String[] cells = l.split("\t", -1);
            int lineNo = i + 1;
            String id = cell(cells, species);
            List<CrossReference> keys = new ArrayList<>();
            for (Map.Entry<String, Integer> k : keyColumns.entrySet()) {
                String value = cell(cells, k.getValue());
                if (value.isEmpty()) {
                    continue;
                }
                keys.add(CrossReference.of(k.getKey(), value).orElseThrow(() -> new AtomLedgerException(displayPath + ":"
                        + lineNo + ": '" + value + "' in column " + k.getKey() + " is not a " + k.getKey() + " id")));
            }
            if (id.isEmpty() && keys.isEmpty()) {
                throw new AtomLedgerException(displayPath + ":" + lineNo + ": the row has no species id"
                        + (keyColumns.isEmpty() ? "" : " and no cross-reference"));
            }
            String s = cell(cells, smiles);
            String n = cell(cells, inchi);
            Entry e = !s.isEmpty() ? new Entry(id, "smiles", s, lineNo)
                    : !n.isEmpty() ? new Entry(id, "inchi", n, lineNo) : null;
            if (e == null) {
                // A row with empty structure cells says "no structure known", as spreadsheets export them.
                continue;
            }
            if (!id.isEmpty()) {
                Entry previous = entries.putIfAbsent(id, e);
                if (previous != null) {
                    throw new AtomLedgerException(displayPath + ":" + lineNo + ": species " + id
                            + " is listed twice (first at line " + previous.line() + ")");
                }
            }
            for (CrossReference x : keys) {
                Entry previous = references.putIfAbsent(x, e);
                if (previous != null) {
                    throw new AtomLedgerException(displayPath + ":" + lineNo + ": " + x
                            + " is listed twice (first at line " + previous.line() + ")");
                }
            }
        }
        return new StructureTable(displayPath, entries, references);
    }

    private static String cell(String[] cells, int index) {
        return index >= 0 && index < cells.length ? cells[index].strip() : "";
    }

    /** The file as reports name it ("" for the empty table). */
    public String file() {
        return file;
    }

    /** Rows keyed by species id, in file order. */
    public Map<String, Entry> entries() {
        return entries;
    }

    /** Rows keyed by cross-reference, in file order. */
    public Map<CrossReference, Entry> references() {
        return references;
    }

    @Override
    public String display() {
        return file;
    }

    @Override
    public SpeciesStructures.Source speciesSource() {
        return SpeciesStructures.Source.TABLE;
    }

    @Override
    public Optional<StructureFile.Entry> species(String id) {
        return Optional.ofNullable(entries.get(id)).map(this::entry);
    }

    @Override
    public Optional<StructureFile.Entry> reference(CrossReference reference) {
        return Optional.ofNullable(references.get(reference)).map(this::entry);
    }

    private StructureFile.Entry entry(Entry e) {
        return new StructureFile.Entry(e.kind(), file + ":" + e.line(), e.line(), e.text());
    }

    @Override
    public String text(StructureFile.Entry entry) {
        return entry.key();
    }
}
