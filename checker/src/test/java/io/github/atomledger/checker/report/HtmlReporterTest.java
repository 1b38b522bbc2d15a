package io.github.atomledger.checker.report;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.engine.RunResult;

import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.xml.sax.InputSource;

/** The HTML report on the demo: well-formed, self-contained, with summaries, cards and pictures. */
class HtmlReporterTest {

    static final Path OUT = Path.of("target", "reports-demo");
    static RunResult result;
    static String html;

    @BeforeAll
    static void writeDemoReport() throws Exception {
        result = DemoReports.runMapped();
        DemoReports.writeAll(result, OUT, MappingSource.FROM_ENGINE);
        html = Files.readString(OUT.resolve("report.html"));
    }

    static Document parse(String text) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newDefaultInstance();
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", false);
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        f.setExpandEntityReferences(false);
        return f.newDocumentBuilder().parse(new InputSource(new StringReader(text)));
    }

    @Test
    void isWellFormedXmlWithOneArticlePerReaction() throws Exception {
        Document doc = parse(html);
        assertThat(doc.getDocumentElement().getTagName()).isEqualTo("html");
        assertThat(doc.getElementsByTagName("article").getLength()).isEqualTo(result.models().get(0).reactions().size());
        assertThat(html).startsWith("<!DOCTYPE html>");
    }

    @Test
    void fetchesNothingAndRunsNoScript() {
        assertThat(html).doesNotContain("<script").doesNotContain("http://localhost")
                .doesNotContainPattern("(src|href)=\"https?:")
                .doesNotContain("@import").doesNotContain("url(http");
    }

    @Test
    void styleSheetNeedsNoEscapingBecauseHtmlReadsStyleAsRawText() {
        String css = html.substring(html.indexOf("<style>") + 7, html.indexOf("</style>"));
        assertThat(css).doesNotContain("&").doesNotContain("<").doesNotContain(">").contains("#sev-all:checked");
    }

    @Test
    void drawsTheEnginesAtomMapsAndSaysWhyOthersHaveNone() throws Exception {
        long withMap = result.models().get(0).reactions().stream().filter(r -> r.mapping() != null
                && r.mapping().hasMap()).count();
        assertThat(withMap).isGreaterThan(20);
        assertThat(html).contains("id=\"m0-R_FBA\"");
        Matcher m = Pattern.compile("style=\"--pic:url\\(pictures/([0-9a-f]{32}\\.svg)\\);").matcher(html);
        Set<String> files = new TreeSet<>();
        long pictures = 0;
        while (m.find()) {
            pictures++;
            files.add(m.group(1));
        }
        assertThat(pictures).as("one picture per map").isEqualTo(withMap);
        for (String f : files) {
            String svg = Files.readString(OUT.resolve("pictures").resolve(f));
            assertThat(svg).startsWith("<?xml").contains("#indices:target");
            assertThat(html).contains("--pic-idx:url(pictures/" + f + "#indices)");
        }
        try (Stream<Path> all = Files.list(OUT.resolve("pictures"))) {
            assertThat(all.count()).as("nothing but the pictures the page shows").isEqualTo(files.size());
        }
        assertThat(html).contains("id=\"show-idx\"").doesNotContain("<img");
        // Issue #13: coloured carbons carry their labels always; unchanged cofactors are muted.
        String allSvg = files.stream().map(f -> {
            try {
                return Files.readString(OUT.resolve("pictures").resolve(f));
            } catch (java.io.IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        }).collect(java.util.stream.Collectors.joining());
        assertThat(allSvg).containsPattern("class='muted[^']*' opacity='0\\.3'");
        assertThat(html).as("exchange reactions are not mapped").contains("Not attempted: ");
    }

    @Test
    void showsEquationNamesIdsAndTheBalanceTable() {
        assertThat(html).contains("fructose-bisphosphate aldolase").contains("<code>fdp_c</code>")
                .contains("reactants").contains("products");
    }

    @Test
    void mappedReportIsByteStableAndMatchesTheJsonSchema() throws Exception {
        assertThat(new HtmlReporter().toHtml(result)).isEqualTo(html);
        assertThat(JsonSchemas.errors(JsonSchemas.report(), new JsonReporter().toJson(result))).isEmpty();
        assertThat(JsonSchemas.errors(JsonSchemas.sarif(), new SarifReporter().toSarif(result))).isEmpty();
    }

    @Test
    void rendersWithoutMappingData() throws Exception {
        String plain = new HtmlReporter(MappingSource.NONE).toHtml(result);
        parse(plain);
        assertThat(withoutTraces(plain)).doesNotContain("<img").doesNotContain("--pic:")
                .contains("No atom map for this reaction: balance only.");
    }

    /** The page without its carbon-trace section (issue #14), which draws from the traces, not the mapping source. */
    private static String withoutTraces(String page) {
        int start = page.indexOf("<section class=\"traces\"");
        return start < 0 ? page : page.substring(0, start) + page.substring(page.indexOf("</section>", start) + 10);
    }
}
