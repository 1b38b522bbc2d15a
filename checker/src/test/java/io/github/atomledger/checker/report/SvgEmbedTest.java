package io.github.atomledger.checker.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import javax.xml.stream.XMLStreamException;
import org.junit.jupiter.api.Test;

/** Copying drawings into the page: parsed, ids prefixed, numbers shortened, active content refused. */
class SvgEmbedTest {

    private static final String SVG = "<?xml version='1.0' encoding='UTF-8'?>\n"
            + "<!DOCTYPE svg PUBLIC \"-//W3C//DTD SVG 1.1//EN\" \"http://www.w3.org/Graphics/SVG/1.1/DTD/svg11.dtd\">\n"
            + "<svg xmlns='http://www.w3.org/2000/svg' xmlns:xlink='http://www.w3.org/1999/xlink' width='10.125px'>"
            + "<!-- note --><defs><g id='a'/></defs><g id='mol1' class='reactant mol'>"
            + "<path d='M1.234 -0.051L2.25 3.0' fill='url(#a)'/><use xlink:href='#a'/></g></svg>";

    private static String copy(String svg) throws XMLStreamException {
        XmlOut x = new XmlOut();
        x.start("div");
        SvgEmbed.copy(svg, "p-", x.writer());
        x.end();
        return x.finish();
    }

    @Test
    void prefixesIdsAndReferencesAndDropsDeclarationsAndComments() throws Exception {
        String out = copy(SVG);
        assertThat(out).contains("<svg xmlns=\"http://www.w3.org/2000/svg\"").contains("id=\"p-mol1\"")
                .contains("fill=\"url(#p-a)\"").contains("href=\"#p-a\"")
                .doesNotContain("<?xml").doesNotContain("DOCTYPE").doesNotContain("note");
    }

    @Test
    void roundsCoordinatesToATenthOfAPixel() throws Exception {
        assertThat(copy(SVG)).contains("d=\"M1.2 -0.1L2.3 3.0\"").contains("width=\"10.1px\"");
        assertThat(SvgEmbed.shorten("-0.04 0.05")).isEqualTo("0 0.1");
    }

    @Test
    void refusesScriptsAndEventHandlers() {
        assertThatThrownBy(() -> copy("<svg xmlns='http://www.w3.org/2000/svg'><script>x()</script></svg>"))
                .isInstanceOf(XMLStreamException.class).hasMessageContaining("script");
        assertThatThrownBy(() -> copy("<svg xmlns='http://www.w3.org/2000/svg'><g onload='x()'/></svg>"))
                .isInstanceOf(XMLStreamException.class).hasMessageContaining("onload");
    }
}
