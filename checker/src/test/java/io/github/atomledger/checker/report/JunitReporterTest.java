package io.github.atomledger.checker.report;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.engine.RunResult;

import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.xml.XMLConstants;
import javax.xml.transform.stream.StreamSource;
import javax.xml.validation.SchemaFactory;
import javax.xml.xpath.XPath;
import javax.xml.xpath.XPathFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;

/**
 * JUnit XML, validated with javax.xml.validation against {@code junit-ci.xsd} (the JUnit XML schema
 * CI servers accept, written from memory; see SCHEMAS.md beside it).
 */
class JunitReporterTest {

    @TempDir
    Path tmp;

    private static void validate(String xml) throws Exception {
        SchemaFactory f = SchemaFactory.newInstance(XMLConstants.W3C_XML_SCHEMA_NS_URI);
        f.setProperty(XMLConstants.ACCESS_EXTERNAL_SCHEMA, "");
        f.setProperty(XMLConstants.ACCESS_EXTERNAL_DTD, "");
        f.newSchema(JunitReporterTest.class.getResource("junit-ci.xsd")).newValidator()
                .validate(new StreamSource(new StringReader(xml)));
    }

    private static String xpath(Document doc, String expression) throws Exception {
        XPath x = XPathFactory.newDefaultInstance().newXPath();
        return x.evaluate(expression, doc);
    }

    @Test
    void failingReactionBecomesAFailedBalanceCaseWithItsMessages() throws Exception {
        RunResult result = Fixtures.run("charge-gap.xml");
        String xml = new JunitReporter().toXml(result);
        validate(xml);
        Document doc = HtmlReporterTest.parse(xml);
        assertThat(xpath(doc, "count(/testsuites/testsuite)")).isEqualTo("1");
        assertThat(xpath(doc, "/testsuites/testsuite/@name")).isEqualTo("charge-gap.xml");
        String hex = "/testsuites/testsuite/testcase[@name='R_HEX' and @classname='charge-gap.balance']";
        assertThat(xpath(doc, hex + "/failure/@type")).isEqualTo("balance.charge");
        assertThat(xpath(doc, hex + "/failure")).contains("balance.elements").contains("balance.charge")
                .contains("charge-gap.xml:");
        assertThat(xpath(doc, "count(//testcase[@name='R_HEX' and @classname='charge-gap.model']/failure)")).isEqualTo("0");
        assertThat(xpath(doc, "count(//testcase[@name='R_PGI']/failure)")).isEqualTo("0");
        assertThat(xpath(doc, "/testsuites/testsuite/@failures")).as("R_HEX balance and x_c model").isEqualTo("2");
        assertThat(xpath(doc, "//testcase[@name='x_c']/failure/@type")).isEqualTo("model.formula-invalid");
    }

    @Test
    void exchangeReactionBalanceCaseIsSkippedAndModelFindingsHaveTheirOwnCase() throws Exception {
        RunResult result = Fixtures.run("charge-gap.xml");
        Document doc = HtmlReporterTest.parse(new JunitReporter().toXml(result));
        assertThat(xpath(doc, "//testcase[@name='R_EX_glc' and @classname='charge-gap.balance']/skipped/@message"))
                .startsWith("sink reaction");
        assertThat(xpath(doc, "count(//testcase[@name='x_c' and @classname='charge-gap.model'])")).isEqualTo("1");
        long reactions = result.models().get(0).reactions().size();
        assertThat(Long.parseLong(xpath(doc, "/testsuites/testsuite/@tests")))
                .as("model and balance case per reaction, plus model-level cases").isGreaterThan(2 * reactions);
    }

    @Test
    void demoReportValidatesAndIsWrittenIntoTheJunitDirectory() throws Exception {
        RunResult result = DemoReports.run(tmp);
        Path file = new JunitReporter().write(result, tmp);
        assertThat(tmp.relativize(file).toString().replace('\\', '/')).isEqualTo("junit/TEST-atomledger.xml");
        validate(Files.readString(file));
    }

    @Test
    void stemDropsDirectoriesAndExtensionsAndDots() {
        assertThat(JunitReporter.stem("models/yeast-GEM.xml.gz")).isEqualTo("yeast-GEM");
        assertThat(JunitReporter.stem("a/b/core.v2.xml")).isEqualTo("core_v2");
    }
}
