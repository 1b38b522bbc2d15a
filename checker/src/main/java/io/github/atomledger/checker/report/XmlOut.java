package io.github.atomledger.checker.report;

import java.io.StringWriter;
import javax.xml.stream.XMLOutputFactory;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamWriter;

/**
 * A thin layer over the JDK's {@link XMLStreamWriter} (never string-built markup): escaping is the
 * writer's, the JDK's own factory is used so the bytes do not depend on which StAX library is on
 * the class path, and line breaks are placed explicitly so the output is stable.
 */
final class XmlOut {

    private final StringWriter buffer = new StringWriter();
    private final XMLStreamWriter w;

    XmlOut() {
        try {
            w = XMLOutputFactory.newDefaultFactory().createXMLStreamWriter(buffer);
        } catch (XMLStreamException e) {
            throw new IllegalStateException("the JDK's XML writer is not available", e);
        }
    }

    XMLStreamWriter writer() {
        return w;
    }

    XmlOut declaration() throws XMLStreamException {
        w.writeStartDocument("UTF-8", "1.0");
        return nl();
    }

    XmlOut doctype(String text) throws XMLStreamException {
        w.writeDTD(text);
        return nl();
    }

    XmlOut start(String name) throws XMLStreamException {
        w.writeStartElement(name);
        return this;
    }

    /** Starts an element with a class attribute (HTML). */
    XmlOut start(String name, String cssClass) throws XMLStreamException {
        w.writeStartElement(name);
        if (cssClass != null && !cssClass.isEmpty()) {
            w.writeAttribute("class", cssClass);
        }
        return this;
    }

    XmlOut attr(String name, String value) throws XMLStreamException {
        w.writeAttribute(name, value);
        return this;
    }

    XmlOut attr(String name, long value) throws XMLStreamException {
        w.writeAttribute(name, Long.toString(value));
        return this;
    }

    XmlOut text(String text) throws XMLStreamException {
        w.writeCharacters(text);
        return this;
    }

    /** An element with only text inside. */
    XmlOut leaf(String name, String cssClass, String text) throws XMLStreamException {
        start(name, cssClass);
        w.writeCharacters(text);
        w.writeEndElement();
        return this;
    }

    /** A void element ({@code <meta/>}, {@code <input/>}); never use for elements with content. */
    XmlOut empty(String name) throws XMLStreamException {
        w.writeEmptyElement(name);
        return this;
    }

    XmlOut end() throws XMLStreamException {
        w.writeEndElement();
        return this;
    }

    XmlOut nl() throws XMLStreamException {
        w.writeCharacters("\n");
        return this;
    }

    XmlOut indent(int depth) throws XMLStreamException {
        w.writeCharacters("\n" + "  ".repeat(depth));
        return this;
    }

    /** Closes the document and returns the text, ending with one '\n'. */
    String finish() throws XMLStreamException {
        w.writeEndDocument();
        w.flush();
        w.close();
        String s = buffer.toString();
        return s.endsWith("\n") ? s : s + "\n";
    }
}
