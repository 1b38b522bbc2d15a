package io.github.atomledger.checker.baseline;

import io.github.atomledger.checker.AtomLedgerException;

import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.ByteBuffer;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The accepted findings of a model repository, committed next to the models as a tab-separated
 * text file (UTF-8, '\n'):
 * <pre>
 * # AtomLedger baseline: accepted findings. ...comment lines...
 * model	rule	element	fingerprint	acceptedBy	reason
 * models/core.xml	balance.elements	R_BIOMASS	5d0c6f0b8e8e1a2b	mkrause	lumped growth reaction
 * </pre>
 * Lines starting with {@code #} and blank lines are comments; the first other line is the column
 * header, exactly as above. Entries are written sorted by model, rule, element, fingerprint, one
 * per line and without timestamps, so that a diff of the file shows exactly which acceptances
 * were added or removed. The reason is the last column and may contain spaces; no field holds a
 * tab. Two entries with the same model, rule, element and fingerprint are an error.
 *
 * <p>Immutable. Does not handle: wildcards (an entry accepts one finding's facts, not a rule).
 */
public final class Baseline {

    /** The column header line. */
    public static final String HEADER = "model\trule\telement\tfingerprint\tacceptedBy\treason";

    /** Reasons starting with this are not reasons yet. */
    public static final String PLACEHOLDER_PREFIX = "TODO";

    /** The reason written for new entries; the curator replaces it. */
    public static final String PLACEHOLDER_REASON = PLACEHOLDER_PREFIX + ": say why this finding is accepted";

    private static final List<String> PREAMBLE = List.of(
            "# AtomLedger baseline: findings accepted in this model repository, one per line, tab-separated.",
            "# A finding listed here is reported with status \"accepted\" and does not fail the build,",
            "# as long as its model, rule, element and data fingerprint stay the same.",
            "# A reason that is empty or starts with \"" + PLACEHOLDER_PREFIX + "\" accepts nothing: write why, then commit.",
            "# Written by the atomledger baseline goal, sorted; reasons and acceptedBy are kept on update.");

    private final List<BaselineEntry> entries;
    private final Map<BaselineEntry.Key, BaselineEntry> byKey;

    private Baseline(List<BaselineEntry> entries) {
        this.entries = entries.stream().sorted(BaselineEntry.ORDER).toList();
        Map<BaselineEntry.Key, BaselineEntry> map = new HashMap<>();
        this.entries.forEach(e -> map.put(e.key(), e));
        this.byKey = map;
    }

    /** A baseline with no entries. */
    public static Baseline empty() {
        return new Baseline(List.of());
    }

    /**
     * A baseline of these entries, sorted.
     *
     * @throws IllegalArgumentException when two entries share a key
     */
    public static Baseline of(List<BaselineEntry> entries) {
        Map<BaselineEntry.Key, BaselineEntry> seen = new HashMap<>();
        for (BaselineEntry e : entries) {
            if (seen.put(e.key(), e) != null) {
                throw new IllegalArgumentException("duplicate baseline entry " + e.key());
            }
        }
        return new Baseline(entries);
    }

    public List<BaselineEntry> entries() {
        return entries;
    }

    public Optional<BaselineEntry> find(BaselineEntry.Key key) {
        return Optional.ofNullable(byKey.get(key));
    }

    /**
     * Reads a baseline file.
     *
     * @param file    the file
     * @param display its name in error messages (relative to the project)
     * @throws AtomLedgerException when it cannot be read or a line is malformed (naming the line)
     */
    public static Baseline read(Path file, String display) {
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (java.nio.file.NoSuchFileException e) {
            throw new AtomLedgerException(display + ": baseline file not found", e);
        } catch (IOException e) {
            throw new AtomLedgerException(display + ": cannot read the baseline file: " + e.getMessage(), e);
        }
        try {
            String text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes)).toString();
            return parse(text, display);
        } catch (CharacterCodingException e) {
            throw new AtomLedgerException(display + ": the baseline file is not UTF-8 text", e);
        }
    }

    /**
     * Parses baseline text.
     *
     * @throws AtomLedgerException naming {@code display}, the line and what is wrong
     */
    public static Baseline parse(String text, String display) {
        String[] lines = text.split("\n", -1);
        boolean header = false;
        List<BaselineEntry> out = new ArrayList<>();
        Map<BaselineEntry.Key, Integer> seen = new HashMap<>();
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i].endsWith("\r") ? lines[i].substring(0, lines[i].length() - 1) : lines[i];
            int n = i + 1;
            if (line.isBlank() || line.startsWith("#")) {
                continue;
            }
            if (!header) {
                if (!line.strip().equals(HEADER)) {
                    throw new AtomLedgerException(display + ":" + n + ": expected the column header '"
                            + HEADER.replace("\t", "<tab>") + "', found '" + line.replace("\t", "<tab>") + "'");
                }
                header = true;
                continue;
            }
            BaselineEntry e = entry(line, display, n);
            Integer before = seen.put(e.key(), n);
            if (before != null) {
                throw new AtomLedgerException(display + ":" + n + ": duplicate of the entry on line " + before
                        + " (" + e.ruleId() + " " + e.elementId() + ")");
            }
            out.add(e);
        }
        return new Baseline(out);
    }

    private static BaselineEntry entry(String line, String display, int n) {
        String[] f = line.split("\t", -1);
        if (f.length < 5 || f.length > 6) {
            throw new AtomLedgerException(display + ":" + n + ": expected 6 tab-separated fields (" 
                    + HEADER.replace('\t', ' ') + "), found " + f.length);
        }
        String where = display + ":" + n + ": ";
        if (f[0].isBlank() || f[2].isBlank()) {
            throw new AtomLedgerException(where + "the model and element fields must not be empty");
        }
        if (!f[1].matches("[a-z]+\\.[a-z0-9-]+")) {
            throw new AtomLedgerException(where + "'" + f[1] + "' is not a rule id (<area>.<kebab-name>)");
        }
        if (!Fingerprint.isValid(f[3])) {
            throw new AtomLedgerException(where + "'" + f[3] + "' is not a fingerprint (" + Fingerprint.LENGTH
                    + " lower-case hex digits)");
        }
        return new BaselineEntry(f[0].strip(), f[1], f[2].strip(), f[3], f[4], f.length == 6 ? f[5] : "", n);
    }

    /** The file text: preamble, header, one sorted line per entry. Same entries, same bytes. */
    public String format() {
        StringBuilder sb = new StringBuilder();
        PREAMBLE.forEach(l -> sb.append(l).append('\n'));
        sb.append(HEADER).append('\n');
        for (BaselineEntry e : entries) {
            sb.append(e.modelFile()).append('\t').append(e.ruleId()).append('\t').append(e.elementId()).append('\t')
                    .append(e.fingerprint()).append('\t').append(e.acceptedBy()).append('\t').append(e.reason()).append('\n');
        }
        return sb.toString();
    }

    /** Writes {@link #format()} whole: a temporary file beside the target, then a move. */
    public void write(Path file) throws IOException {
        Path dir = file.toAbsolutePath().getParent();
        Files.createDirectories(dir);
        Path tmp = Files.createTempFile(dir, "." + file.getFileName(), ".tmp");
        try {
            Files.writeString(tmp, format(), StandardCharsets.UTF_8);
            try {
                Files.move(tmp, file, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
