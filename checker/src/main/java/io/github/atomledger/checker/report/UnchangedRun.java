package io.github.atomledger.checker.report;

import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.Version;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.gate.GateConfig;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.security.CodeSource;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import java.util.stream.Stream;

/**
 * Reuse of an unchanged run: when every input of a {@code check} run is byte for byte what an
 * earlier run had, its reports, console lines and verdict are put back instead of computed again.
 *
 * <p>The key is a SHA-256 over the AtomLedger version and the bytes of its own code (so a rebuilt
 * snapshot never reuses an older one's output), the whole {@link RunConfig} and {@link GateConfig},
 * a variant chosen by the caller (for example whether the console is coloured), and the path and
 * content of every file the run reads: the model files the patterns match, the structure sources
 * (directories walked in name order), the curated RXN maps, the pathways, fates and baseline files.
 * Nothing is reused when the cache directory is off, when a release gate compares with previous
 * models (a tree the key does not follow), or when any of those files cannot be read.
 *
 * <p>Stored below the cache directory: {@code runs/<key>.txt} (the console lines, the failure
 * message and the report files with their content hash) and {@code runs/blobs/<hash>} (each file
 * once). Restoring links (or copies) every file back into the report directory, removes pictures
 * the stored run did not have, and returns the lines to print; a missing blob makes it return
 * nothing before anything is touched, and the caller runs normally. Report files are always
 * replaced by a move, never written through, so a link never changes a stored blob.
 *
 * <p>Progress lines of the stored run are not kept (the caller records only what it wants shown
 * again). Not thread-safe per instance.
 */
public final class UnchangedRun {

    private static final String HEADER = "atomledger-unchanged-run 1";
    private static final Map<Path, String> CODE_HASHES = new ConcurrentHashMap<>();

    /**
     * What a run printed and decided.
     *
     * @param lines   the console lines, in order
     * @param failure the message the goal failed with, or null when it passed
     */
    public record Outcome(List<ConsoleSummary.Line> lines, String failure) {
        public Outcome {
            lines = List.copyOf(lines);
        }
    }

    private final Path reportDirectory;
    private final Path record;
    private final Path blobs;

    private UnchangedRun(Path reportDirectory, Path runs, String key) {
        this.reportDirectory = reportDirectory;
        this.record = runs.resolve(key.substring(0, 2)).resolve(key + ".txt");
        this.blobs = runs.resolve("blobs");
    }

    /**
     * The reuse handle of this run, or empty when this run cannot be reused (see the class comment).
     *
     * @param variant anything else the caller's output depends on (for example "colour")
     * @param code    classes of the caller whose code shapes the output (their jars join the key)
     */
    public static Optional<UnchangedRun> of(RunConfig config, GateConfig gate, String variant, Class<?>... code) {
        Path cache = config.mapping().cacheDirectory();
        if (cache == null || (gate != null && gate.previousModels() != null)) {
            return Optional.empty();
        }
        try {
            MessageDigest d = sha256();
            text(d, HEADER);
            text(d, Version.get());
            text(d, codeHash(UnchangedRun.class));
            text(d, codeHash(io.github.atomledger.atommapper.mapping.AtomMapper.class));
            for (Class<?> c : code) {
                text(d, codeHash(c));
            }
            text(d, variant);
            text(d, config.toString());
            text(d, String.valueOf(gate));
            Path base = config.baseDirectory();
            for (Path model : Engine.modelFiles(config)) {
                file(d, base, model);
            }
            for (Path source : config.mapping().structureSources()) { // the structure table is the first
                file(d, base, source);
            }
            file(d, base, config.mapping().curatedMaps());
            file(d, base, config.traces().pathways());
            file(d, base, config.traces().fates());
            file(d, base, gate == null ? null : gate.baseline());
            String key = HexFormat.of().formatHex(d.digest());
            return Optional.of(new UnchangedRun(config.reportDirectory(), cache.resolve("runs"), key));
        } catch (IOException | UncheckedIOException | AtomLedgerException e) {
            return Optional.empty();
        }
    }

    /**
     * Puts the stored run's report files back and returns what it printed and decided; empty when
     * there is no stored run for this key or a stored file is missing (then nothing was changed).
     *
     * @throws IOException when the report directory cannot be written
     */
    public Optional<Outcome> restore() throws IOException {
        if (!Files.isRegularFile(record)) {
            return Optional.empty();
        }
        List<ConsoleSummary.Line> lines = new ArrayList<>();
        String failure = null;
        Map<String, String> files = new LinkedHashMap<>();
        List<String> text = Files.readAllLines(record, StandardCharsets.UTF_8);
        if (text.isEmpty() || !text.get(0).equals(HEADER)) {
            return Optional.empty();
        }
        for (String row : text.subList(1, text.size())) {
            String[] f = row.split("\t", -1);
            switch (f[0]) {
                case "line" -> lines.add(new ConsoleSummary.Line(ConsoleSummary.Level.valueOf(f[1]), unescape(f[2])));
                case "failure" -> failure = unescape(f[1]);
                case "file" -> files.put(unescape(f[1]), f[2]);
                default -> {
                    return Optional.empty();
                }
            }
        }
        for (String hash : files.values()) {
            if (!Files.isRegularFile(blob(hash))) {
                return Optional.empty();
            }
        }
        Path pictures = reportDirectory.resolve(PictureFiles.FOLDER);
        if (files.containsKey("report.html") && Files.isDirectory(pictures)) {
            // as the HTML report does: pictures of other runs go
            try (Stream<Path> old = Files.list(pictures)) {
                for (Path p : old.toList()) {
                    String rel = reportDirectory.relativize(p).toString().replace('\\', '/');
                    if (!files.containsKey(rel) && p.getFileName().toString().endsWith(".svg")) {
                        Files.deleteIfExists(p);
                    }
                }
            }
        }
        for (Map.Entry<String, String> e : files.entrySet()) {
            place(blob(e.getValue()), reportDirectory.resolve(e.getKey()));
        }
        return Optional.of(new Outcome(lines, failure));
    }

    /**
     * Stores this run: the lines and failure to show again, and the report files it wrote (with
     * the pictures of the HTML report). A file that cannot be stored leaves no record.
     */
    public void store(Outcome outcome, List<Path> written) throws IOException {
        List<Path> files = new ArrayList<>(written);
        Path pictures = reportDirectory.resolve(PictureFiles.FOLDER);
        if (written.contains(reportDirectory.resolve("report.html")) && Files.isDirectory(pictures)) {
            try (Stream<Path> all = Files.list(pictures)) {
                all.filter(Files::isRegularFile).sorted().forEach(files::add);
            }
        }
        StringBuilder sb = new StringBuilder(HEADER).append('\n');
        for (ConsoleSummary.Line l : outcome.lines()) {
            sb.append("line\t").append(l.level().name()).append('\t').append(escape(l.text())).append('\n');
        }
        if (outcome.failure() != null) {
            sb.append("failure\t").append(escape(outcome.failure())).append('\n');
        }
        for (Path f : files) {
            String hash = hash(f);
            Path blob = blob(hash);
            if (!Files.isRegularFile(blob)) {
                ReportFiles.copy(f, blob);
            }
            String rel = reportDirectory.relativize(f).toString().replace('\\', '/');
            sb.append("file\t").append(escape(rel)).append('\t').append(hash).append('\n');
        }
        ReportFiles.write(record, sb.toString());
    }

    private Path blob(String hash) {
        return blobs.resolve(hash.substring(0, 2)).resolve(hash);
    }

    /** The blob at {@code target}: a hard link where the file system allows, else a copy; always by a move. */
    private static void place(Path blob, Path target) throws IOException {
        Files.createDirectories(target.toAbsolutePath().getParent());
        Path tmp = target.resolveSibling("." + target.getFileName() + ".restore");
        Files.deleteIfExists(tmp);
        try {
            Files.createLink(tmp, blob);
        } catch (FileSystemException | UnsupportedOperationException e) {
            Files.copy(blob, tmp, StandardCopyOption.REPLACE_EXISTING);
        }
        try {
            ReportFiles.replace(tmp, target);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /** Path (relative to the base where it can be) and content of a file, or of every file below a directory. */
    private static void file(MessageDigest d, Path base, Path path) throws IOException {
        if (path == null) {
            text(d, "-");
            return;
        }
        Path p = base == null ? path : base.resolve(path);
        if (Files.isDirectory(p)) {
            text(d, "dir " + path);
            try (Stream<Path> all = Files.walk(p)) {
                for (Path f : all.filter(Files::isRegularFile).sorted().toList()) {
                    text(d, p.relativize(f).toString());
                    content(d, f);
                }
            }
        } else if (Files.isRegularFile(p)) {
            text(d, "file " + path);
            content(d, p);
        } else {
            text(d, "absent " + path);
        }
    }

    private static void content(MessageDigest d, Path f) throws IOException {
        text(d, hash(f));
    }

    private static String hash(Path f) throws IOException {
        MessageDigest d = sha256();
        byte[] buf = new byte[1 << 16];
        try (InputStream in = Files.newInputStream(f)) {
            int n;
            while ((n = in.read(buf)) > 0) {
                d.update(buf, 0, n);
            }
        }
        return HexFormat.of().formatHex(d.digest());
    }

    /** The hash of the jar (or class directory) a class was loaded from, once per JVM. */
    private static String codeHash(Class<?> type) throws IOException {
        CodeSource source = type.getProtectionDomain().getCodeSource();
        if (source == null || source.getLocation() == null) {
            throw new IOException("no code source for " + type.getName());
        }
        Path where;
        try {
            where = Path.of(source.getLocation().toURI());
        } catch (java.net.URISyntaxException | IllegalArgumentException e) {
            throw new IOException("code source of " + type.getName() + " is not a file", e);
        }
        String known = CODE_HASHES.get(where);
        if (known != null) {
            return known;
        }
        MessageDigest d = sha256();
        file(d, null, where);
        String hash = HexFormat.of().formatHex(d.digest());
        CODE_HASHES.put(where, hash);
        return hash;
    }

    private static void text(MessageDigest d, String s) {
        d.update(s.getBytes(StandardCharsets.UTF_8));
        d.update((byte) 0);
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java platform", e);
        }
    }

    static String escape(String s) {
        return s.replace("\\", "\\\\").replace("\t", "\\t").replace("\n", "\\n").replace("\r", "\\r");
    }

    static String unescape(String s) {
        StringBuilder sb = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '\\' && i + 1 < s.length()) {
                char n = s.charAt(++i);
                sb.append(switch (n) {
                    case 't' -> '\t';
                    case 'n' -> '\n';
                    case 'r' -> '\r';
                    default -> n;
                });
            } else {
                sb.append(c);
            }
        }
        return sb.toString();
    }
}
