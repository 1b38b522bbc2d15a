package io.github.atomledger.checker.annotate;

import io.github.atomledger.checker.transitions.StoredStructure;
import io.github.atomledger.checker.transitions.TransitionAnnotation;
import io.github.atomledger.checker.transitions.ModelText;
import io.github.atomledger.checker.transitions.AnnotationIndex;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.MappingConfig;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.RunConfig;
import io.github.atomledger.checker.engine.RunListener;
import io.github.atomledger.checker.engine.RunResult;
import io.github.atomledger.checker.report.Reporters;

import java.io.BufferedReader;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import java.util.zip.GZIPInputStream;
import java.util.zip.GZIPOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * Issue 7, data safety: {@code check} never writes a model; {@code annotate} writes through a
 * temporary file in the same directory and an atomic move, keeps permissions, the XML declaration,
 * the encoding, a byte-order mark, CRLF line ends and gzip, refuses a file that changed since it
 * was read, and a writer killed at any moment leaves either the old or the complete new file.
 *
 * <p>Models are written by the tests (encodings and sizes vary); the engine test uses the demo
 * model ({@code demo/models/ledgerella_central.xml}, invented organism) and its structure table.
 */
class AnnotateSafetyTest {

    private static final Path DEMO = Path.of("..", "demo");

    @TempDir
    Path dir;

    // ---- fixtures -------------------------------------------------------------------------

    /** One annotation per reaction R0..R(n-1); the two variants differ in every element. */
    static Map<String, TransitionAnnotation> annotations(int reactions, String variant) {
        Map<String, TransitionAnnotation> out = new LinkedHashMap<>();
        for (int i = 0; i < reactions; i++) {
            String from = variant + "_src" + i;
            String to = variant + "_dst" + i;
            out.put("R" + i, new TransitionAnnotation(TransitionAnnotation.INFERRED, "mapped", 2, "1",
                    List.of(new AtomTransition(new AtomRef(from, 1, 1), new AtomRef(to, 1, 1), "C")),
                    "[CH3:1]>>[CH3:1]", List.of(new StoredStructure(from, "sha256:00", "C"))));
        }
        return out;
    }

    /** A Level 3 model with {@code reactions} reactions, one non-ASCII name, given line ends. */
    static String model(int reactions, String declaration, String nl) {
        StringBuilder sb = new StringBuilder(declaration).append(nl);
        sb.append("<!-- Ledgerella halotolerans BW-7 test model, Brackwater Field Station (invented). -->").append(nl);
        sb.append("<sbml xmlns=\"http://www.sbml.org/sbml/level3/version1/core\" level=\"3\" version=\"1\">").append(nl);
        sb.append("  <model id=\"bw7\" name=\"Brackw\u00e4sser \u00e9tude\">").append(nl);
        sb.append("    <listOfReactions>").append(nl);
        for (int i = 0; i < reactions; i++) {
            sb.append("      <reaction id=\"R").append(i).append("\" reversible=\"false\">").append(nl);
            sb.append("        <notes><body xmlns=\"http://www.w3.org/1999/xhtml\"><p>step ").append(i)
                    .append(" \u00b5M</p></body></notes>").append(nl);
            sb.append("        <listOfReactants>").append(nl);
            sb.append("          <speciesReference species=\"s").append(i).append("\" stoichiometry=\"1\" constant=\"true\"/>")
                    .append(nl);
            sb.append("        </listOfReactants>").append(nl);
            sb.append("      </reaction>").append(nl);
        }
        sb.append("    </listOfReactions>").append(nl).append("  </model>").append(nl).append("</sbml>").append(nl);
        return sb.toString();
    }

    /** The text with everything AtomLedger adds removed (our elements and the wrappers it created). */
    static String stripOurs(String text) {
        return text.replaceAll("(?s)\\R[ \\t]*<annotation>\\s*<atl:atomTransitions.*?</atl:atomTransitions>\\s*</annotation>", "")
                .replaceAll("(?s)\\s*<atl:atomTransitions.*?</atl:atomTransitions>", "");
    }

    private static byte[] gzip(byte[] bytes) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (GZIPOutputStream z = new GZIPOutputStream(out)) {
            z.write(bytes);
        }
        return out.toByteArray();
    }

    private static byte[] gunzip(byte[] bytes) throws IOException {
        try (GZIPInputStream in = new GZIPInputStream(new ByteArrayInputStream(bytes))) {
            return in.readAllBytes();
        }
    }

    private static String sha256(Path file) throws IOException {
        return ModelText.digest(Files.readAllBytes(file));
    }

    private static List<String> listing(Path directory) throws IOException {
        try (Stream<Path> s = Files.list(directory)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    private static List<Path> tempFiles(Path directory) throws IOException {
        try (Stream<Path> s = Files.list(directory)) {
            return s.filter(p -> p.getFileName().toString().endsWith(".atomledger-tmp")).toList();
        }
    }

    // ---- check never writes -----------------------------------------------------------------

    @Test
    @Timeout(value = 10, unit = TimeUnit.MINUTES)
    void checkThroughTheEngineNeverWritesTheModel() throws Exception {
        Path models = Files.createDirectories(dir.resolve("models"));
        Path file = models.resolve("ledgerella_central.xml");
        Files.copy(DEMO.resolve("models/ledgerella_central.xml"), file);
        Files.copy(DEMO.resolve("structures.tsv"), dir.resolve("structures.tsv"));
        Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("r--r--r--"));
        Files.setLastModifiedTime(file, FileTime.fromMillis(1_700_000_000_000L));
        String before = sha256(file);
        List<String> listingBefore = listing(models);

        RunConfig config = RunConfig.defaults(dir, RunConfig.DEFAULT_MODELS)
                .withMapping(new MappingConfig(true, dir.resolve("structures.tsv"), MappingOptions.defaults(), 2,
                        dir.resolve("cache")));
        RunResult result = new Engine().run(config, RunListener.SILENT);
        Reporters.forFormats(config.formats()).write(result, config.reportDirectory());

        assertThat(sha256(file)).isEqualTo(before);
        assertThat(Files.getLastModifiedTime(file).toMillis()).isEqualTo(1_700_000_000_000L);
        assertThat(PosixFilePermissions.toString(Files.getPosixFilePermissions(file))).isEqualTo("r--r--r--");
        assertThat(listing(models)).isEqualTo(listingBefore);

        // The dry run of annotate on the same result writes nothing either, though it would change the file.
        ModelResult m = result.models().get(0);
        ModelAnnotator.Outcome dry = new ModelAnnotator(false, true, 1L << 30)
                .annotate(file, m.file(), AnnotationPlan.of(m));
        assertThat(dry.wouldChange()).isTrue();
        assertThat(dry.written()).isFalse();
        assertThat(sha256(file)).isEqualTo(before);
        assertThat(listing(models)).isEqualTo(listingBefore);

        // Control: annotate proper does change this file, so the checksums above could have caught a write.
        Path copy = dir.resolve("copy.xml");
        Files.copy(file, copy);
        Files.setPosixFilePermissions(copy, PosixFilePermissions.fromString("rw-r--r--"));
        new ModelAnnotator(false, false, 1L << 30).annotate(copy, "copy.xml", AnnotationPlan.of(m));
        assertThat(sha256(copy)).isNotEqualTo(before);
    }

    @Test
    void dryRunWritesNothingAndLeavesNoTemporaryFile() throws Exception {
        Path file = dir.resolve("m.xml");
        Files.writeString(file, model(3, "<?xml version=\"1.0\" encoding=\"UTF-8\"?>", "\n"));
        String before = sha256(file);
        ModelAnnotator.Outcome out = new ModelAnnotator(false, true, 1 << 20).annotate(file, "m.xml", annotations(3, "a"));
        assertThat(out.wouldChange()).isTrue();
        assertThat(out.written()).isFalse();
        assertThat(sha256(file)).isEqualTo(before);
        assertThat(listing(dir)).containsExactly("m.xml");
    }

    // ---- annotate keeps the file's form -------------------------------------------------------

    /** The forms a curator's file may have. */
    enum Form {
        UTF8("<?xml version=\"1.0\" encoding=\"UTF-8\"?>", StandardCharsets.UTF_8, false, "\n", false),
        UTF8_BOM("<?xml version=\"1.0\" encoding=\"UTF-8\"?>", StandardCharsets.UTF_8, true, "\n", false),
        ISO_8859_1("<?xml version='1.0' encoding='ISO-8859-1' standalone='no'?>", StandardCharsets.ISO_8859_1, false,
                "\n", false),
        CRLF("<?xml version=\"1.0\" encoding=\"UTF-8\"?>", StandardCharsets.UTF_8, false, "\r\n", false),
        GZIP("<?xml version=\"1.0\" encoding=\"UTF-8\"?>", StandardCharsets.UTF_8, false, "\n", true),
        GZIP_ISO_CRLF("<?xml version=\"1.0\" encoding=\"ISO-8859-1\"?>", StandardCharsets.ISO_8859_1, false, "\r\n", true);

        final String declaration;
        final Charset charset;
        final boolean bom;
        final String nl;
        final boolean gzip;

        Form(String declaration, Charset charset, boolean bom, String nl, boolean gzip) {
            this.declaration = declaration;
            this.charset = charset;
            this.bom = bom;
            this.nl = nl;
            this.gzip = gzip;
        }

        byte[] encode(String text) throws IOException {
            byte[] body = text.getBytes(charset);
            byte[] xml = body;
            if (bom) {
                xml = new byte[body.length + 3];
                xml[0] = (byte) 0xEF;
                xml[1] = (byte) 0xBB;
                xml[2] = (byte) 0xBF;
                System.arraycopy(body, 0, xml, 3, body.length);
            }
            return gzip ? gzip(xml) : xml;
        }
    }

    @ParameterizedTest
    @EnumSource(Form.class)
    void annotateKeepsDeclarationEncodingBomLineEndsAndCompression(Form form) throws Exception {
        String original = model(3, form.declaration, form.nl);
        Path file = dir.resolve(form.gzip ? "m.xml.gz" : "m.xml");
        Files.write(file, form.encode(original));

        ModelAnnotator.Outcome out = new ModelAnnotator(false, false, 1 << 20).annotate(file, "m.xml", annotations(3, "a"));
        assertThat(out.written()).isTrue();

        byte[] raw = Files.readAllBytes(file);
        assertThat((raw[0] & 0xff) == 0x1f && (raw[1] & 0xff) == 0x8b).as("gzip kept").isEqualTo(form.gzip);
        byte[] xml = form.gzip ? gunzip(raw) : raw;
        boolean bom = (xml[0] & 0xff) == 0xEF && (xml[1] & 0xff) == 0xBB && (xml[2] & 0xff) == 0xBF;
        assertThat(bom).as("byte-order mark kept").isEqualTo(form.bom);
        String text = new String(xml, bom ? 3 : 0, xml.length - (bom ? 3 : 0), form.charset);
        assertThat(text).startsWith(form.declaration + form.nl);
        assertThat(text).contains("Brackw\u00e4sser \u00e9tude").contains("\u00b5M");
        if (form.charset == StandardCharsets.ISO_8859_1) {
            // a-umlaut is the single byte E4 in ISO-8859-1; its UTF-8 form C3 A4 must not appear.
            assertThat(indexOf(xml, new byte[] {(byte) 0xC3, (byte) 0xA4})).isEqualTo(-1);
            assertThat(indexOf(xml, new byte[] {'w', (byte) 0xE4, 's'})).isPositive();
        }
        if (form.nl.equals("\r\n")) {
            assertThat(text.replace("\r\n", "")).doesNotContain("\n").doesNotContain("\r");
        } else {
            assertThat(text).doesNotContain("\r");
        }
        assertThat(text).contains("<atl:atomTransitions");
        assertThat(stripOurs(text)).isEqualTo(original);
        assertThat(AnnotationIndex.read(file, "m.xml", 1 << 20).stored("R1")).contains(annotations(3, "a").get("R1"));
        assertThat(tempFiles(dir)).isEmpty();
    }

    private static int indexOf(byte[] haystack, byte[] needle) {
        outer:
        for (int i = 0; i + needle.length <= haystack.length; i++) {
            for (int k = 0; k < needle.length; k++) {
                if (haystack[i + k] != needle[k]) {
                    continue outer;
                }
            }
            return i;
        }
        return -1;
    }

    @Test
    void annotateKeepsPermissions() throws Exception {
        for (String perms : List.of("rw-------", "rw-r-----", "rw-rw-r--")) {
            Path file = dir.resolve("p" + perms.hashCode() + ".xml");
            Files.writeString(file, model(2, "<?xml version=\"1.0\" encoding=\"UTF-8\"?>", "\n"));
            Files.setPosixFilePermissions(file, PosixFilePermissions.fromString(perms));
            new ModelAnnotator(false, false, 1 << 20).annotate(file, "p.xml", annotations(2, "a"));
            assertThat(Files.readString(file)).contains("<atl:atomTransitions");
            assertThat(PosixFilePermissions.toString(Files.getPosixFilePermissions(file))).isEqualTo(perms);
        }
        assertThat(tempFiles(dir)).isEmpty();
    }

    @Test
    void annotateRefusesAFileThatChangedSinceItWasRead() throws Exception {
        Path file = dir.resolve("m.xml");
        String original = model(2, "<?xml version=\"1.0\" encoding=\"UTF-8\"?>", "\n");
        Files.writeString(file, original);
        String theirs = original + "<!-- a curator's edit, saved while annotate ran -->\n";
        assertThatThrownBy(() -> new ModelAnnotator(false, false, 1 << 20).annotate(file, "models/m.xml",
                annotations(2, "a"), () -> write(file, theirs)))
                .isInstanceOf(AtomLedgerException.class)
                .hasMessage("models/m.xml: the file changed since it was read; nothing was written");
        assertThat(Files.readString(file)).isEqualTo(theirs);
        assertThat(tempFiles(dir)).isEmpty();
        // Control: without the concurrent edit the same call writes.
        assertThat(new ModelAnnotator(false, false, 1 << 20).annotate(file, "models/m.xml", annotations(2, "a"),
                () -> { }).written()).isTrue();
    }

    private static void write(Path file, String text) {
        try {
            Files.writeString(file, text);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    // ---- a writer killed at any moment ---------------------------------------------------------

    @Test
    @Timeout(value = 10, unit = TimeUnit.MINUTES)
    void killedWriterLeavesTheOldOrTheCompleteNewFileAndTheNextRunWorks() throws Exception {
        int reactions = 2_000;
        Path models = Files.createDirectories(dir.resolve("models"));
        Path file = models.resolve("big.xml");
        String text = model(reactions, "<?xml version=\"1.0\" encoding=\"UTF-8\"?>", "\n");
        Files.writeString(file, text);

        // The only states the file may ever be in: the original, or the complete version after
        // annotation set a or set b (the child alternates between them).
        byte[] original = Files.readAllBytes(file);
        Path scratch = Files.createDirectories(dir.resolve("scratch"));
        Path s = scratch.resolve("big.xml");
        Files.write(s, original);
        ModelAnnotator annotator = new ModelAnnotator(false, false, Long.MAX_VALUE);
        annotator.annotate(s, "big.xml", annotations(reactions, "a"));
        byte[] versionA = Files.readAllBytes(s);
        annotator.annotate(s, "big.xml", annotations(reactions, "b"));
        byte[] versionB = Files.readAllBytes(s);
        annotator.annotate(s, "big.xml", annotations(reactions, "a"));
        assertThat(Files.readAllBytes(s)).isEqualTo(versionA);
        List<String> valid = List.of(ModelText.digest(original), ModelText.digest(versionA), ModelText.digest(versionB));

        List<String> log = new ArrayList<>();
        int strayTemps = 0;
        java.util.Set<Integer> statesSeen = new java.util.TreeSet<>();
        // Kills at fixed delays after the child is up, and kills timed by the appearance of the
        // k-th temporary file (k = 1: during the first write; k = 2, 3: after complete writes).
        long[] delaysMs = {0, 200};
        int[] tempNumbers = {1, 2, 3};
        for (int run = 0; run < delaysMs.length + tempNumbers.length; run++) {
            Process child = startChild(file, reactions);
            String when;
            if (run < delaysMs.length) {
                Thread.sleep(delaysMs[run]);
                when = delaysMs[run] + " ms";
            } else {
                int k = tempNumbers[run - delaysMs.length];
                waitForTempFile(models, k, child);
                when = "temporary file " + k;
            }
            child.destroyForcibly();
            assertThat(child.waitFor(60, TimeUnit.SECONDS)).isTrue();
            String state = sha256(file);
            assertThat(valid).as("state after a kill at %s", when).contains(state);
            statesSeen.add(valid.indexOf(state));
            boolean left = !tempFiles(models).isEmpty();
            strayTemps += left ? 1 : 0;
            log.add(when + ": state " + valid.indexOf(state) + (left ? ", stray temporary file" : ""));
        }
        System.out.println("killed writer: " + log);
        // Evidence that the kills hit both phases: some while a temporary file was being written,
        // and the file was seen in a completed new version too.
        assertThat(strayTemps).as("kills during a write: %s", log).isPositive();
        assertThat(statesSeen).as("states seen: %s", log).contains(0).containsAnyOf(1, 2);

        // Stray temporary files are hidden, not model files, and do not disturb the next run.
        assertThat(tempFiles(models)).allSatisfy(p -> assertThat(p.getFileName().toString()).startsWith(".big.xml."));
        ModelAnnotator.Outcome next = annotator.annotate(file, "models/big.xml", annotations(reactions, "a"));
        assertThat(Files.readAllBytes(file)).isEqualTo(versionA);
        assertThat(next.changes()).hasSize(reactions);
        RunResult check = new Engine().run(RunConfig.defaults(dir, RunConfig.DEFAULT_MODELS), RunListener.SILENT);
        assertThat(check.models()).extracting(ModelResult::file).containsExactly("models/big.xml");
    }

    /** Spins until the {@code k}-th new temporary file (one per write of the child) has appeared. */
    private static void waitForTempFile(Path directory, int k, Process child) throws IOException {
        java.util.Set<String> before = new java.util.HashSet<>();
        for (Path p : tempFiles(directory)) {
            before.add(p.getFileName().toString());
        }
        java.util.Set<String> seen = new java.util.HashSet<>();
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
        while (System.nanoTime() < deadline && child.isAlive()) {
            for (Path p : tempFiles(directory)) {
                if (!before.contains(p.getFileName().toString())) {
                    seen.add(p.getFileName().toString());
                }
            }
            if (seen.size() >= k) {
                return;
            }
            Thread.onSpinWait();
        }
        throw new AssertionError("no temporary file number " + k + " appeared");
    }

    private Process startChild(Path file, int reactions) throws IOException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        ProcessBuilder pb = new ProcessBuilder(java, "-Xmx1g", "-cp", System.getProperty("java.class.path"),
                KilledWriter.class.getName(), file.toString(), Integer.toString(reactions));
        pb.redirectErrorStream(true);
        Process p = pb.start();
        BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8));
        String line = out.readLine();
        assertThat(line).as("child started").isEqualTo("STARTED");
        // Drain the rest so that the child never blocks on a full pipe.
        Thread drain = new Thread(() -> {
            try {
                while (out.readLine() != null) {
                    // discard
                }
            } catch (IOException ignored) {
                // the child was killed
            }
        });
        drain.setDaemon(true);
        drain.start();
        return p;
    }
}
