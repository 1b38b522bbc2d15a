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
 * in a plain file, by one decompressing pass for gzip). Records that cannot be used (no
 * {@code M  END}, no id) are kept as problems. Thread-safe.
 */
public final class SdFile implements StructureFile {

    /** The default data item holding the id. */
    public static final String DEFAULT_ID_FIELD = "ChEBI ID";

    private static final String MAGIC = "atomledger-sd-index-1";

    private record Rec(int number, long line, long offset, long length) {
    }

    private final String display;
    private final Path path;
    private final boolean gzip;
    private final Map<Integer, Rec> records = new HashMap<>();
    private final Map<String, Integer> bySpecies = new HashMap<>();
    private final Map<CrossReference, Integer> byReference = new HashMap<>();
    private final List<SpeciesStructures.Problem> problems = new ArrayList<>();
    private final Map<Integer, String> texts = new HashMap<>();
    private final boolean fromCache;

    private SdFile(String display, Path path, boolean gzip, String field, List<SdFileScanner.Record> scanned,
                   boolean fromCache) {
        this.display = display;
        this.path = path;
        this.gzip = gzip;
        this.fromCache = fromCache;
        String prefix = CrossReference.prefixNamed(field).orElse(null);
        for (SdFileScanner.Record r : scanned) {
            if (r.problem() != null) {
                problems.add(new SpeciesStructures.Problem("", "unusable-record", SpeciesStructures.Source.SD_FILE, display,
                        r.problem(), (int) Math.min(Integer.MAX_VALUE, r.line()), origin(r.number(), r.line())));
                continue;
            }
            records.put(r.number(), new Rec(r.number(), r.line(), r.offset(), r.length()));
            for (String v : r.values()) {
                bySpecies.putIfAbsent(v, r.number());
                Optional<CrossReference> x = prefix != null ? CrossReference.of(prefix, v) : CrossReference.fromName(v);
                x.ifPresent(ref -> byReference.putIfAbsent(ref, r.number()));
            }
        }
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
            if (index != null && Files.isRegularFile(index)) {
                List<SdFileScanner.Record> cached = readIndex(index);
                if (cached != null) {
                    return new SdFile(display, path, gzip, idField, cached, true);
                }
            }
            List<SdFileScanner.Record> scanned = new ArrayList<>();
            try (InputStream in = StructureFiles.open(path)) {
                SdFileScanner.scan(in, idField, scanned::add);
            }
            if (index != null) {
                writeIndex(index, scanned);
            }
            return new SdFile(display, path, gzip, idField, scanned, false);
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
        return Optional.ofNullable(byReference.get(reference)).map(this::entry);
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
            if (r != null && !texts.containsKey(r.number())) {
                wanted.put(r.offset(), r);
            }
        }
        if (wanted.isEmpty()) {
            return;
        }
        try {
            if (gzip) {
                try (InputStream in = StructureFiles.open(path)) {
                    long at = 0;
                    for (Rec r : wanted.values()) {
                        in.skipNBytes(r.offset() - at);
                        byte[] bytes = in.readNBytes((int) r.length());
                        at = r.offset() + bytes.length;
                        texts.put(r.number(), SdFileScanner.molfilePart(new String(bytes, StandardCharsets.UTF_8)));
                    }
                }
            } else {
                try (RandomAccessFile file = new RandomAccessFile(path.toFile(), "r")) {
                    for (Rec r : wanted.values()) {
                        byte[] bytes = new byte[(int) r.length()];
                        file.seek(r.offset());
                        file.readFully(bytes);
                        texts.put(r.number(), SdFileScanner.molfilePart(new String(bytes, StandardCharsets.UTF_8)));
                    }
                }
            }
        } catch (IOException e) {
            throw new AtomLedgerException(display + ": cannot read records of the SD file (changed since it was indexed?): "
                    + e.getMessage(), e);
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

    private static void writeIndex(Path index, List<SdFileScanner.Record> records) {
        try {
            Files.createDirectories(index.getParent());
            Path tmp = Files.createTempFile(index.getParent(), "index", ".tmp");
            try (DataOutputStream out = new DataOutputStream(new BufferedOutputStream(Files.newOutputStream(tmp), 1 << 16))) {
                out.writeUTF(MAGIC);
                out.writeInt(records.size());
                for (SdFileScanner.Record r : records) {
                    out.writeInt(r.number());
                    out.writeLong(r.line());
                    out.writeLong(r.offset());
                    out.writeLong(r.length());
                    out.writeUTF(r.problem() == null ? "" : r.problem());
                    out.writeShort(Math.min(r.values().size(), Short.MAX_VALUE));
                    for (String v : r.values().subList(0, Math.min(r.values().size(), Short.MAX_VALUE))) {
                        out.writeUTF(v.length() > 10_000 ? v.substring(0, 10_000) : v);
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
    private static List<SdFileScanner.Record> readIndex(Path index) {
        try (DataInputStream in = new DataInputStream(new BufferedInputStream(Files.newInputStream(index), 1 << 16))) {
            if (!MAGIC.equals(in.readUTF())) {
                return null;
            }
            int n = in.readInt();
            List<SdFileScanner.Record> out = new ArrayList<>(n);
            for (int i = 0; i < n; i++) {
                int number = in.readInt();
                long line = in.readLong();
                long offset = in.readLong();
                long length = in.readLong();
                String problem = in.readUTF();
                int values = in.readShort();
                List<String> v = new ArrayList<>(values);
                for (int k = 0; k < values; k++) {
                    v.add(in.readUTF());
                }
                out.add(new SdFileScanner.Record(number, line, offset, length, v, problem.isEmpty() ? null : problem));
            }
            return out;
        } catch (IOException | RuntimeException e) {
            return null;
        }
    }
}
