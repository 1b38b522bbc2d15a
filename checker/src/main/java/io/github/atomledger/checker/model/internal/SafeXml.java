package io.github.atomledger.checker.model.internal;

import com.ctc.wstx.stax.WstxInputFactory;

import javax.xml.stream.Location;
import javax.xml.stream.XMLInputFactory;
import javax.xml.stream.XMLStreamException;

/**
 * The one way AtomLedger reads XML: a Woodstox factory with DTD support, external entities and
 * entity replacement off, and a resolver that refuses every external resource; plus the shared
 * wording of parse errors ({@code file:line:column: message}, one line).
 */
public final class SafeXml {

    private SafeXml() {
    }

    /** A new hardened factory (factories are not shared between threads). */
    public static XMLInputFactory factory() {
        XMLInputFactory f = new WstxInputFactory();
        f.setProperty(XMLInputFactory.SUPPORT_DTD, Boolean.FALSE);
        f.setProperty(XMLInputFactory.IS_SUPPORTING_EXTERNAL_ENTITIES, Boolean.FALSE);
        f.setProperty(XMLInputFactory.IS_REPLACING_ENTITY_REFERENCES, Boolean.FALSE);
        f.setXMLResolver((publicId, systemId, base, ns) -> {
            throw new XMLStreamException("external resources are never loaded (" + systemId + ")");
        });
        return f;
    }

    /** {@code "file:line:column: "}, or {@code "file: "} when the location is unknown. */
    public static String where(String file, Location loc) {
        if (loc == null || loc.getLineNumber() <= 0) {
            return file + ": ";
        }
        return file + ":" + loc.getLineNumber() + ":" + loc.getColumnNumber() + ": ";
    }

    private static final java.util.regex.Pattern JAVA_CLASS = java.util.regex.Pattern.compile(
            "\\b(?:[a-z][a-z0-9_]*\\.)+[A-Z][A-Za-z0-9_$]*(?:Exception|Error)\\b:?\\s*");

    /** Woodstox's message without its "ParseError at [row,col]" prefix, on one line. */
    public static String clean(XMLStreamException e) {
        String m = e.getMessage() == null ? e.toString() : e.getMessage();
        int i = m.indexOf("Message: ");
        if (i >= 0) {
            m = m.substring(i + "Message: ".length());
        }
        m = m.replaceAll("\\s*\\R\\s*", " ").replaceAll("\\s*at \\[row,col[^\\]]*\\]: \\[[0-9,]*\\]", "");
        // Woodstox appends the nested exception ("...: com.ctc.wstx.exc.WstxParsingException: ..."); a
        // curator needs the sentence, not the Java class, and the sentence is already there once.
        m = JAVA_CLASS.matcher(m).replaceAll("");
        m = m.replaceAll("\\s*at \\[row,col.*$", "").strip();
        int k = m.lastIndexOf(": ");
        if (k > 0 && m.substring(k + 2).strip().equals(m.substring(0, k).strip())) {
            m = m.substring(0, k).strip();
        }
        return m;
    }
}
