package io.github.atomledger.checker.report;

import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.RunResult;

import java.util.Map;
import javax.xml.stream.XMLStreamException;

/**
 * A run-level section of the HTML report, written after the header and before the filters and
 * the model sections (the overview of problems is the first). A further section (pathways,
 * coverage, ...) is one class and one entry in {@link HtmlReporter#SECTIONS}.
 */
interface HtmlSection {

    /**
     * Writes the section.
     *
     * @param prefixes the id prefix of each model's section ({@code m0}, {@code m1}, ...); a
     *                 reaction card's id is {@code <prefix>-<token(reaction id)>} ({@link HtmlReporter#anchor})
     */
    void write(XmlOut x, RunResult result, Map<ModelResult, String> prefixes) throws XMLStreamException;
}
