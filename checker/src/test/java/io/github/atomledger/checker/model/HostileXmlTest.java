package io.github.atomledger.checker.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.catchThrowable;

import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.transitions.AnnotationIndex;

import com.ctc.wstx.stax.WstxInputFactory;
import com.sun.net.httpserver.HttpServer;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.zip.GZIPOutputStream;
import javax.xml.stream.XMLInputFactory;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamReader;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * Hostile and broken XML through both of our XML readers: {@link ModelLoader} (JSBML behind the
 * recording StAX delegate) and {@link AnnotationIndex} (the text-offset scan used by mapping and
 * {@code annotate}). Each attack is first shown to work against an unhardened StAX factory (the
 * JDK default and Woodstox with its defaults), so a test here fails if our hardening is removed.
 *
 * <p>Fixtures are written by the tests (they need a temporary secret file and a local port):
 * XXE with a local file, billion laughs, an external DTD and an external parameter entity on a
 * 127.0.0.1 listener, a gzip bomb, malformed XML, non-SBML XML, SBML Level 1, an empty file.
 */
class HostileXmlTest {

    private static final String SECRET = "BW7-SECRET-7f3a9c";

    /** The two readers of model files; both must refuse the same things. */
    enum Reader {
        MODEL_LOADER {
            @Override
            void read(Path file, String display, long cap) {
                new ModelLoader(new LoadOptions(cap)).load(file, display);
            }
        },
        ANNOTATION_INDEX {
            @Override
            void read(Path file, String display, long cap) {
                AnnotationIndex.read(file, display, cap);
            }
        };

        abstract void read(Path file, String display, long cap);

        void read(Path file) {
            read(file, "models/" + file.getFileName(), LoadOptions.DEFAULT_MAX_BYTES);
        }
    }

    @TempDir
    Path dir;

    private HttpServer server;
    private final AtomicInteger hits = new AtomicInteger();
    private final List<String> paths = new ArrayList<>();

    @BeforeEach
    void startListener() throws IOException {
        // Local only: the listener counts every request an XML reader makes for a DTD or entity.
        server = HttpServer.create(new InetSocketAddress(InetAddress.getLoopbackAddress(), 0), 0);
        server.createContext("/", exchange -> {
            hits.incrementAndGet();
            synchronized (paths) {
                paths.add(exchange.getRequestURI().getPath());
            }
            byte[] body = ("<!ENTITY remote \"" + SECRET + "-remote\">").getBytes(StandardCharsets.UTF_8);
            exchange.sendResponseHeaders(200, body.length);
            try (OutputStream out = exchange.getResponseBody()) {
                out.write(body);
            }
        });
        server.setExecutor(Executors.newSingleThreadExecutor());
        server.start();
    }

    @AfterEach
    void stopListener() {
        server.stop(0);
        ((java.util.concurrent.ExecutorService) server.getExecutor()).shutdownNow();
    }

    private String base() {
        return "http://127.0.0.1:" + server.getAddress().getPort();
    }

    private static String sbml(String doctype, String speciesName) {
        return sbml(doctype, speciesName, "Brackwater Field Station");
    }

    private static String sbml(String doctype, String speciesName, String notesText) {
        return "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n" + doctype
                + "<sbml xmlns=\"http://www.sbml.org/sbml/level3/version1/core\" level=\"3\" version=\"1\">\n"
                + "  <model id=\"bw7_hostile\">\n"
                + "    <notes><p xmlns=\"http://www.w3.org/1999/xhtml\">" + notesText + "</p></notes>\n"
                + "    <listOfCompartments><compartment id=\"c\" constant=\"true\"/></listOfCompartments>\n"
                + "    <listOfSpecies>\n"
                + "      <species id=\"s1\" name=\"" + speciesName + "\" compartment=\"c\" hasOnlySubstanceUnits=\"false\""
                + " boundaryCondition=\"false\" constant=\"false\"/>\n"
                + "    </listOfSpecies>\n"
                + "  </model>\n"
                + "</sbml>\n";
    }

    private Path write(String name, String text) throws IOException {
        Path file = dir.resolve(name);
        Files.writeString(file, text, StandardCharsets.UTF_8);
        return file;
    }

    private Path secretFile() throws IOException {
        return write("secret.txt", SECRET);
    }

    private Path xxeModel() throws IOException {
        Path secret = secretFile();
        return write("xxe.xml", sbml("<!DOCTYPE sbml [<!ENTITY xxe SYSTEM \"" + secret.toUri() + "\">]>\n", "x", "&xxe;"));
    }

    /** Every text an unhardened reader delivers (attribute values and character data). */
    private static String drain(XMLInputFactory factory, Path file) throws Exception {
        StringBuilder sb = new StringBuilder();
        try (InputStream in = Files.newInputStream(file)) {
            XMLStreamReader r = factory.createXMLStreamReader(file.toUri().toString(), in);
            while (r.hasNext()) {
                int e = r.next();
                if (e == XMLStreamConstants.START_ELEMENT) {
                    for (int i = 0; i < r.getAttributeCount(); i++) {
                        sb.append(r.getAttributeValue(i)).append('\n');
                    }
                } else if (e == XMLStreamConstants.CHARACTERS) {
                    sb.append(r.getText());
                }
            }
        }
        return sb.toString();
    }

    private static List<XMLInputFactory> unhardenedFactories() {
        return List.of(XMLInputFactory.newDefaultFactory(), new WstxInputFactory());
    }

    /** The messages of an exception and all its causes, the text a user or a log could see. */
    private static String allMessages(Throwable t) {
        StringBuilder sb = new StringBuilder();
        for (Throwable c = t; c != null; c = c.getCause()) {
            sb.append(c).append('\n');
        }
        return sb.toString();
    }

    // ---- controls: the fixtures are real attacks --------------------------------------------

    @Test
    void unhardenedReadersLeakTheLocalFileThroughAnExternalEntity() throws Exception {
        Path file = xxeModel();
        for (XMLInputFactory f : unhardenedFactories()) {
            assertThat(drain(f, file)).as(f.getClass().getName()).contains(SECRET);
        }
    }

    @Test
    void unhardenedReadersFetchAnExternalDtd() throws Exception {
        Path file = write("dtd.xml", sbml("<!DOCTYPE sbml SYSTEM \"" + base() + "/control.dtd\">\n", "x"));
        for (XMLInputFactory f : unhardenedFactories()) {
            int before = hits.get();
            drain(f, file);
            assertThat(hits.get()).as(f.getClass().getName()).isGreaterThan(before);
        }
    }

    @Test
    void unhardenedReadersExpandNestedEntities() throws Exception {
        Path file = write("laughs-small.xml", sbml(laughs(3), "&lol3;"));
        for (XMLInputFactory f : unhardenedFactories()) {
            // 10^3 copies of "lol": the expansion a billion-laughs file multiplies further.
            assertThat(drain(f, file)).as(f.getClass().getName()).contains("lol".repeat(1000));
        }
    }

    // ---- our readers ------------------------------------------------------------------------

    @ParameterizedTest
    @EnumSource(Reader.class)
    void externalEntityToALocalFileIsRefusedAndNeverLeaks(Reader reader) throws Exception {
        Path file = xxeModel();
        Throwable t = catchThrowable(() -> reader.read(file));
        assertThat(t).isInstanceOf(AtomLedgerException.class)
                .hasMessageStartingWith("models/xxe.xml:2")
                .hasMessageContaining("DOCTYPE declarations are refused");
        assertThat(allMessages(t)).doesNotContain(SECRET);
    }

    @ParameterizedTest
    @EnumSource(Reader.class)
    @Timeout(60)
    void billionLaughsIsRefusedBeforeAnyExpansion(Reader reader) throws Exception {
        Path file = write("laughs.xml", sbml(laughs(9), "&lol9;"));
        assertThatThrownBy(() -> reader.read(file)).isInstanceOf(AtomLedgerException.class)
                .hasMessageContaining("DOCTYPE declarations are refused")
                .hasMessageNotContaining("lollol");
    }

    @ParameterizedTest
    @EnumSource(Reader.class)
    void externalDtdIsNeverFetched(Reader reader) throws Exception {
        Path file = write("dtd.xml", sbml("<!DOCTYPE sbml SYSTEM \"" + base() + "/ours.dtd\">\n", "x"));
        assertThatThrownBy(() -> reader.read(file)).isInstanceOf(AtomLedgerException.class)
                .hasMessageContaining("DOCTYPE declarations are refused");
        assertThat(hits.get()).as("requests to the listener: %s", paths).isZero();
    }

    @ParameterizedTest
    @EnumSource(Reader.class)
    void externalParameterEntityIsNeverFetched(Reader reader) throws Exception {
        Path file = write("pe.xml", sbml("<!DOCTYPE sbml [<!ENTITY % ext SYSTEM \"" + base() + "/pe.dtd\"> %ext;]>\n",
                "&remote;"));
        Throwable t = catchThrowable(() -> reader.read(file));
        assertThat(t).isInstanceOf(AtomLedgerException.class);
        assertThat(allMessages(t)).doesNotContain(SECRET);
        assertThat(hits.get()).as("requests to the listener: %s", paths).isZero();
    }

    @ParameterizedTest
    @EnumSource(Reader.class)
    void undeclaredEntityReferenceInContentIsRefusedWithItsLine(Reader reader) throws Exception {
        Path file = write("entity.xml", sbml("", "x", "&remote;"));
        assertThatThrownBy(() -> reader.read(file)).isInstanceOf(AtomLedgerException.class)
                .hasMessageStartingWith("models/entity.xml:4")
                .hasMessageContaining("entity references are refused");
        assertThat(hits.get()).isZero();
    }

    @Test
    void undeclaredEntityReferenceInAnAttributeIsNeverResolved() throws Exception {
        // Woodstox without DTD support drops an undeclared reference from an attribute value
        // (a known limit, docs/guarantees.md); what matters here is that nothing is fetched or read.
        Path file = write("attr.xml", sbml("", "a&remote;b"));
        ModelView model = new ModelLoader(LoadOptions.defaults()).load(file, "models/attr.xml");
        assertThat(model.species().get(0).name()).doesNotContain(SECRET).doesNotContain("remote");
        assertThat(hits.get()).isZero();
    }

    @ParameterizedTest
    @EnumSource(Reader.class)
    @Timeout(120)
    void gzipBombStopsAtTheConfiguredCap(Reader reader) throws Exception {
        // 16 MiB of comment inside a valid model compresses to well under 1 MiB.
        Path file = dir.resolve("bomb.xml.gz");
        String head = sbml("", "x");
        int split = head.indexOf("<sbml");
        try (OutputStream out = new GZIPOutputStream(Files.newOutputStream(file), 1 << 16)) {
            out.write(head.substring(0, split).getBytes(StandardCharsets.UTF_8));
            out.write("<!--".getBytes(StandardCharsets.UTF_8));
            byte[] block = new byte[1 << 20];
            java.util.Arrays.fill(block, (byte) 'a');
            for (int i = 0; i < 16; i++) {
                out.write(block);
            }
            out.write("-->\n".getBytes(StandardCharsets.UTF_8));
            out.write(head.substring(split).getBytes(StandardCharsets.UTF_8));
        }
        assertThat(Files.size(file)).isLessThan(1 << 20);
        assertThatThrownBy(() -> reader.read(file, "models/bomb.xml.gz", 4L << 20))
                .isInstanceOf(AtomLedgerException.class)
                .hasMessageStartingWith("models/bomb.xml.gz: ")
                .hasMessageContaining("exceeds the cap of 4194304 bytes");
        // The cap is what stops it: with the default cap (1 GiB) the same file is a valid model.
        reader.read(file, "models/bomb.xml.gz", LoadOptions.DEFAULT_MAX_BYTES);
    }

    @ParameterizedTest
    @EnumSource(Reader.class)
    void plainFileOverTheCapIsRefusedToo(Reader reader) throws Exception {
        Path file = write("big.xml", sbml("", "x".repeat(10_000)));
        assertThatThrownBy(() -> reader.read(file, "models/big.xml", 4096))
                .isInstanceOf(AtomLedgerException.class)
                .hasMessageContaining("exceeds the cap of 4096 bytes");
    }

    @ParameterizedTest
    @EnumSource(Reader.class)
    void malformedXmlNamesFileLineAndColumn(Reader reader) throws Exception {
        String text = sbml("", "x").replace("<listOfSpecies>", "<listOfSpecies><oops a=\"1\" a=\"2\"/>");
        Path file = write("bad.xml", text);
        assertThatThrownBy(() -> reader.read(file)).isInstanceOf(AtomLedgerException.class)
                .hasMessageMatching("models/bad\\.xml:6:\\d+: malformed XML: \\S.*")
                .satisfies(e -> assertThat(e.getMessage()).doesNotContain("\n").doesNotContain("ParseError"));
    }

    @ParameterizedTest
    @EnumSource(Reader.class)
    void truncatedXmlNamesFileLineAndColumn(Reader reader) throws Exception {
        String text = sbml("", "x");
        Path file = write("cut.xml", text.substring(0, text.indexOf("</model>")));
        assertThatThrownBy(() -> reader.read(file)).isInstanceOf(AtomLedgerException.class)
                .hasMessageMatching("models/cut\\.xml:\\d+:\\d+: malformed XML: \\S.*");
    }

    @ParameterizedTest
    @EnumSource(Reader.class)
    void xmlThatIsNotSbmlSaysSo(Reader reader) throws Exception {
        Path file = write("page.xml", "<?xml version=\"1.0\"?>\n<html xmlns=\"http://www.w3.org/1999/xhtml\"><body/></html>\n");
        assertThatThrownBy(() -> reader.read(file)).isInstanceOf(AtomLedgerException.class)
                .hasMessageStartingWith("models/page.xml:2: not an SBML file")
                .hasMessageContaining("<html>");
    }

    @ParameterizedTest
    @EnumSource(Reader.class)
    void sbmlLevelOneIsUnsupportedAndSaysSo(Reader reader) throws Exception {
        Path file = write("l1.xml", "<?xml version=\"1.0\"?>\n"
                + "<sbml xmlns=\"http://www.sbml.org/sbml/level1\" level=\"1\" version=\"2\"><model name=\"m\"/></sbml>\n");
        assertThatThrownBy(() -> reader.read(file)).isInstanceOf(AtomLedgerException.class)
                .hasMessageStartingWith("models/l1.xml:2: SBML Level 1 is not supported");
    }

    @ParameterizedTest
    @EnumSource(Reader.class)
    void emptyFileIsAClearError(Reader reader) throws Exception {
        Path file = write("empty.xml", "");
        Throwable t = catchThrowable(() -> reader.read(file));
        assertThat(t).isInstanceOf(AtomLedgerException.class);
        assertThat(t.getMessage()).startsWith("models/empty.xml:").doesNotContain("\n");
    }

    @ParameterizedTest
    @EnumSource(Reader.class)
    void binaryGarbageIsAClearError(Reader reader) throws Exception {
        Path file = dir.resolve("garbage.xml");
        byte[] bytes = new byte[4096];
        new java.util.Random(7).nextBytes(bytes);
        Files.write(file, bytes);
        Throwable t = catchThrowable(() -> reader.read(file));
        assertThat(t).isInstanceOf(AtomLedgerException.class);
        assertThat(t.getMessage()).startsWith("models/garbage.xml:").doesNotContain("\n");
    }

    @Test
    void modelLoaderRefusesAnEmptyDocumentElementThatIsNotAModel() throws Exception {
        Path file = write("nomodel.xml", "<?xml version=\"1.0\"?>\n"
                + "<sbml xmlns=\"http://www.sbml.org/sbml/level3/version1/core\" level=\"3\" version=\"1\"/>\n");
        assertThatThrownBy(() -> Reader.MODEL_LOADER.read(file)).isInstanceOf(AtomLedgerException.class)
                .hasMessage("models/nomodel.xml: the SBML document contains no <model>");
    }

    /** A DOCTYPE declaring lol0 = "lol" and lolN = ten times lol(N-1). */
    private static String laughs(int levels) {
        StringBuilder sb = new StringBuilder("<!DOCTYPE sbml [\n  <!ENTITY lol0 \"lol\">\n");
        for (int i = 1; i <= levels; i++) {
            sb.append("  <!ENTITY lol").append(i).append(" \"");
            for (int k = 0; k < 10; k++) {
                sb.append("&lol").append(i - 1).append(';');
            }
            sb.append("\">\n");
        }
        return sb.append("]>\n").toString();
    }
}
