package io.github.atomledger.checker.check.structure;

import io.github.atomledger.atommapper.ctfile.SdFileScanner;
import io.github.atomledger.checker.AtomLedgerException;

import java.io.BufferedInputStream;
import java.io.BufferedOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.RandomAccessFile;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

/**
 * An SD file (plain or gzip) as a structure source: each record's molfile, keyed by the values
 * of one data item (default {@code ChEBI ID}, as in the public ChEBI dump). A value that equals a
 * species id keys that species; otherwise it is read as a cross-reference, in the collection the
 * field names ({@code ChEBI ID} and {@code chebi}: chebi; a field named after another prefix of
 * {@link CrossReference#PREFIXES}: that one) or, for other fields, in the collection its form
 * tells ({@link CrossReference#fromName}).
 *
 * <p>Indexed once: the first run walks the file ({@link SdFileScanner}) and, when a cache
 * directory is given, stores the index (record numbers, lines, byte offsets, ids) under
 * {@code <cache>/sd-index/}, keyed by the file's absolute path, size, modification time and the
 * id field; later runs read the index and fetch only the records their species need (by seeking
 * in a plain file, by one decompressing pass for gzip, whose records are then kept beside the
 * index so that the next run need not decompress again). Records that cannot be used (no
 * {@code M  END}, no id) are kept as problems. Thread-safe.
 */
public final class SdFile implements StructureFile {

    /** The default data item holding the id. */
    public static final String DEFAULT_ID_FIELD = "ChEBI ID";

    private static final String MAGIC = "atomledger-sd-index-2";

    private record Rec(int number, long line, long offset, long length) {
    }

    /** One record of the index: where it is, its id values and their cross-references (as text, "" for none). */
    private record Indexed(int number, long line, long offset, long length, String problem, List<String> values,
                           List<String> references) {
    }

    private final String display;
    private final Path path;
    private final boolean gzip;
    private final Map<Integer, Rec> records = new HashMap<>();
    private final Map<String, Integer> bySpecies = new HashMap<>();
    private final Map<String, Integer> byReference = new HashMap<>();
    private final List<SpeciesStructures.Problem> problems = new ArrayList<>();
    private final Map<Integer, String> texts = new HashMap<>();
    private final boolean fromCache;
    /** Where records read from a gzip file are kept for later runs, or null. */
    private final Path recordCache;

    private SdFile(String display, Path path, boolean gzip, List<Indexed> index, boolean fromCache, Path recordCache) {
        this.display = display;
        this.path = path;
        this.gzip = gzip;
        this.fromCache = fromCache;
        this.recordCache = recordCache;
        for (Indexed r : index) {
            if (r.problem() != null) {
                problems.add(new SpeciesStructures.Problem("", "unusable-record", SpeciesStructures.Source.SD_FILE, display,
                        r.problem(), (int) Math.min(Integer.MAX_VALUE, r.line()), origin(r.number(), r.line())));
                continue;
            }
            records.put(r.number(), new Rec(r.number(), r.line(), r.offset(), r.length()));
            for (int i = 0; i < r.values().size(); i++) {
                bySpecies.putIfAbsent(r.values().get(i), r.number());
                if (!r.references().get(i).isEmpty()) {
                    byReference.putIfAbsent(r.references().get(i), r.number());
                }
            }
        }
    }

    /** The id values of a scanned record with their cross-references, read once when the file is indexed. */
    private static Indexed indexed(SdFileScanner.Record r, String prefix) {
        List<String> refs = new ArrayList<>();
        for (String v : r.values()) {
            Optional<CrossReference> x = prefix != null ? CrossReference.of(prefix, v) : CrossReference.fromName(v);
            refs.add(x.map(CrossReference::toString).orElse(""));
        }
        return new Indexed(r.number(), r.line(), r.offset(), r.length(), r.problem(), r.values(), refs);
    }

    /**
     * Indexes an SD file, or reads its index from {@code cacheDirectory}.
     *
     * @param cacheDirectory where indexes are kept, or null to index on every run
     * @throws AtomLedgerException when the file cannot be read
     */
    public static SdFile load(Path path, String display, String idField, Path cacheDirectory) {
        try {
            boolean gzip = StructureFiles.isGzip(path);
            Path index = cacheDirectory == null ? null : indexFile(path, idField, cacheDirectory);
            Path recordCache = index == null || !gzip ? null
                    : index.resolveSibling(index.getFileName().toString().replace(".idx", ".records"));
            if (index != null && Files.isRegularFile(index)) {
                List<Indexed> cached = readIndex(index);
                if (cached != null) {
                    return new SdFile(display, path, gzip, cached, true, recordCache);
                }
            }
            String prefix = CrossReference.prefixNamed(idField).orElse(null);
            List<Indexed> scanned = new ArrayList<>();
            try (InputStream in = StructureFiles.open(path)) {
                SdFileScanner.scan(in, idField, r -> scanned.add(indexed(r, prefix)));
            }
            if (index != null) {
                writeIndex(index, scanned);
            }
            return new SdFile(display, path, gzip, scanned, false, recordCache);
        } catch (IOException e) {
            throw new AtomLedgerException(display + ": cannot read the SD file: " + e.getMessage(), e);
        }
    }

    /** Whether the index came from the cache (for tests and benchmarks). */
    public boolean indexFromCache() {
        return fromCache;
    }

    /** Usable records. */
    public int recordCount() {
        return records.size();
    }

    private String origin(int number, long line) {
        return display + " record " + number + " (line " + line + ")";
    }

    @Override
    public String display() {
        return display;
    }

    @Override
    public SpeciesStructures.Source speciesSource() {
        return SpeciesStructures.Source.SD_FILE;
    }

    @Override
    public Optional<Entry> species(String id) {
        return Optional.ofNullable(bySpecies.get(id)).map(this::entry);
    }

    @Override
    public Optional<Entry> reference(CrossReference reference) {
        return Optional.ofNullable(byReference.get(reference.toString())).map(this::entry);
    }

    private Entry entry(int number) {
        Rec r = records.get(number);
        return new Entry("molfile", origin(r.number(), r.line()), r.line(), Integer.toString(number));
    }

    @Override
    public List<SpeciesStructures.Problem> problems() {
        return List.copyOf(problems);
    }

    @Override
    public synchronized void prefetch(Collection<Entry> entries) {
        TreeMap<Long, Rec> wanted = new TreeMap<>();
        for (Entry e : entries) {
            Rec r = records.get(Integer.parseInt(e.key()));
            if (r != null && !texts.containsKey(r.number()) && !fromRecordCache(r)) {
                wanted.put(r.offset(), r);
            }
        }
        if (wanted.isEmpty()) {
            return;
        }
        try {
            if (gzip) {
                // A gzip stream cannot seek: one pass, skipping to each wanted record in order.
                try (InputStream in = StructureFiles.open(path)) {
                    long at = 0;
                    for (Rec r : wanted.values()) {
                        in.skipNBytes(r.offset() - at);
                        byte[] bytes = in.readNBytes((int) r.length());
                        at = r.offset() + bytes.length;
                        keep(r, SdFileScanner.molfilePart(new String(bytes, StandardCharsets.UTF_8)));
                    }
                }
            } else {
                try (RandomAccessFile file = new RandomAccessFile(path.toFile(), "r")) {
                    for (Rec r : wanted.values()) {
                        byte[] bytes = new byte[(int) r.length()];
                        file.seek(r.offset());
                        file.readFully(bytes);
                        keep(r, SdFileScanner.molfilePart(new String(bytes, StandardCharsets.UTF_8)));
                    }
                }
            }
        } catch (IOException e) {
            throw new AtomLedgerException(display + ": cannot read records of the SD file (changed since it was indexed?): "
                    + e.getMessage(), e);
        }
    }

    private boolean fromRecordCache(Rec r) {
        if (recordCache == null) {
            return false;
        }
        Path f = recordCache.resolve(r.number() + ".mol");
        try {
            if (Files.isRegularFile(f)) {
                texts.put(r.number(), Files.readString(f, StandardCharsets.UTF_8));
                return true;
            }
        } catch (IOException e) {
            // Read it from the SD file instead.
        }
        return false;
    }

    private void keep(Rec r, String text) {
        texts.put(r.number(), text);
        if (recordCache == null) {
            return;
        }
        try {
            Files.createDirectories(recordCache);
            Path tmp = Files.createTempFile(recordCache, "record", ".tmp");
            Files.writeString(tmp, text, StandardCharsets.UTF_8);
            Files.move(tmp, recordCache.resolve(r.number() + ".mol"), StandardCopyOption.REPLACE_EXISTING,
                    StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException e) {
            // A record that cannot be kept is read from the SD file next time.
        }
    }

    @Override
    public synchronized String text(Entry entry) {
        int number = Integer.parseInt(entry.key());
        if (!texts.containsKey(number)) {
            prefetch(List.of(entry));
        }
        return texts.get(number);
    }

    private static Path indexFile(Path path, String field, Path cacheDirectory) throws IOException {
        Path abs = path.toAbsolutePath().normalize();
        String key = MAGIC + "|" + abs + "|" + Files.size(abs) + "|" + Files.getLastModifiedTime(abs).toMillis() + "|" + field;
        try {
            String hash = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(key.getBytes(StandardCharsets.UTF_8)));
            return cacheDirectory.resolve("sd-index").resolve(hash + ".idx");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    private static void writeIndex(Path index, List<Indexed> records) {
        try {
            Files.createDirectories(index.getParent());
            Path tmp = Files.createTempFile(index.getParent(), "index", ".tmp");
            try (DataOutputStream out = new DataOutputStream(new BufferedOutputStream(Files.newOutputStream(tmp), 1 << 16))) {
                out.writeUTF(MAGIC);
                out.writeInt(records.size());
                for (Indexed r : records) {
                    out.writeInt(r.number());
                    out.writeLong(r.line());
                    out.writeLong(r.offset());
                    out.writeLong(r.length());
                    out.writeUTF(r.problem() == null ? "" : r.problem());
                    out.writeShort(Math.min(r.values().size(), Short.MAX_VALUE));
                    for (int i = 0; i < Math.min(r.values().size(), Short.MAX_VALUE); i++) {
                        String v = r.values().get(i);
                        out.writeUTF(v.length() > 10_000 ? v.substring(0, 10_000) : v);
                        out.writeUTF(r.references().get(i));
                    }
                }
            }
            try {
                Files.move(tmp, index, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, index, StandardCopyOption.REPLACE_EXISTING);
            }
        } catch (IOException e) {
            // An index that cannot be stored only costs time on the next run.
        }
    }

    /** The records of a stored index, or null when it is damaged (it is then rebuilt). */
    private static List<Indexed> readIndex(Path index) {
        try (DataInputStream in = new DataInputStream(new BufferedInputStream(Files.newInputStream(index), 1 << 16))) {
            if (!MAGIC.equals(in.readUTF())) {
                return null;
            }
            int n = in.readInt();
            List<Indexed> out = new ArrayList<>(n);
            for (int i = 0; i < n; i++) {
                int number = in.readInt();
                long line = in.readLong();
                long offset = in.readLong();
                long length = in.readLong();
                String problem = in.readUTF();
                int values = in.readShort();
                List<String> v = new ArrayList<>(values);
                List<String> refs = new ArrayList<>(values);
                for (int k = 0; k < values; k++) {
                    v.add(in.readUTF());
                    refs.add(in.readUTF());
                }
                out.add(new Indexed(number, line, offset, length, problem.isEmpty() ? null : problem, v, refs));
            }
            return out;
        } catch (IOException | RuntimeException e) {
            return null;
        }
    }
}
