package io.github.atomledger.checker.model.internal;

import javax.xml.stream.XMLEventReader;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.events.XMLEvent;

/**
 * What our event readers for JSBML share: JSBML 1.6.1 calls only {@link #hasNext()} and
 * {@link #nextEvent()}; element text is never asked for, since no element JSBML is shown has any.
 */
interface EventSource extends XMLEventReader {

    @Override
    default XMLEvent nextTag() throws XMLStreamException {
        XMLEvent e = nextEvent();
        while (!e.isStartElement() && !e.isEndElement()) {
            e = nextEvent();
        }
        return e;
    }

    /** Unsupported: JSBML reads no element text, and the front end withholds every text-bearing element. */
    @Override
    default String getElementText() {
        throw new UnsupportedOperationException("getElementText");
    }
}
