package io.github.atomledger.checker.model;

import javax.xml.stream.EventFilter;
import javax.xml.stream.events.XMLEvent;

/**
 * Drops every element, with its content, in an SBML Level 3 package namespace
 * ({@code .../level3/version1/fbc/version2}, groups, layout, ...), for reading a whole document with
 * jsbml-core alone, which cannot read package elements (a gene product association ends in a
 * ClassCastException). Stateful: one instance per read.
 */
public final class WithoutPackageElements implements EventFilter {

    private int depth;

    @Override
    public boolean accept(XMLEvent event) {
        if (event.isStartElement()) {
            if (depth > 0 || isPackage(event.asStartElement().getName().getNamespaceURI())) {
                depth++;
                return false;
            }
        } else if (event.isEndElement() && depth > 0) {
            depth--;
            return false;
        }
        return depth == 0;
    }

    private static boolean isPackage(String uri) {
        return uri.startsWith("http://www.sbml.org/sbml/level3/") && !uri.endsWith("/core");
    }
}
