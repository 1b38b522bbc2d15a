package io.github.atomledger.checker.model.internal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.checker.AtomLedgerException;

import java.util.ArrayList;
import java.util.List;
import java.util.NoSuchElementException;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import javax.xml.stream.XMLEventFactory;
import javax.xml.stream.XMLEventReader;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.events.XMLEvent;
import org.junit.jupiter.api.Test;

/** The second-thread hand-over: same events in the same order, the source's error after them, no thread left (issue 8). */
class PipedEventReaderTest {

    private static final XMLEventFactory EVENTS = XMLEventFactory.newInstance();

    /** Events {@code <e0/>} ... up to {@code count} start tags (negative: endless); then {@code failure}, if any. */
    private static final class Source implements XMLEventReader {
        private final int count;
        private final RuntimeException failure;
        private final AtomicInteger made = new AtomicInteger();
        private final AtomicReference<Thread> thread = new AtomicReference<>();

        Source(int count, RuntimeException failure) {
            this.count = count;
            this.failure = failure;
        }

        @Override
        public boolean hasNext() {
            thread.set(Thread.currentThread());
            if (count >= 0 && made.get() >= count) {
                if (failure != null) {
                    throw failure;
                }
                return false;
            }
            return true;
        }

        @Override
        public XMLEvent nextEvent() {
            return EVENTS.createStartElement("", "", "e" + made.getAndIncrement());
        }

        @Override
        public Object next() {
            return nextEvent();
        }

        @Override
        public XMLEvent peek() {
            throw new UnsupportedOperationException();
        }

        @Override
        public String getElementText() {
            throw new UnsupportedOperationException();
        }

        @Override
        public XMLEvent nextTag() {
            throw new UnsupportedOperationException();
        }

        @Override
        public Object getProperty(String name) {
            return null;
        }

        @Override
        public void close() {
        }
    }

    private static List<String> names(XMLEventReader reader) {
        List<String> out = new ArrayList<>();
        while (reader.hasNext()) {
            out.add(((XMLEvent) reader.next()).asStartElement().getName().getLocalPart());
        }
        return out;
    }

    @Test
    void handsOverEveryEventInOrderAcrossBatches() {
        Source source = new Source(1300, null);
        List<String> expected = new ArrayList<>();
        for (int i = 0; i < 1300; i++) {
            expected.add("e" + i);
        }
        try (PipedEventReader piped = new PipedEventReader(source, "test-reader")) {
            assertThat(names(piped)).isEqualTo(expected);
            assertThat(piped.hasNext()).isFalse();
            assertThatThrownBy(piped::nextEvent).isInstanceOf(NoSuchElementException.class);
        }
        assertThat(source.thread.get()).isNotSameAs(Thread.currentThread());
        assertThat(source.thread.get().isAlive()).isFalse();
    }

    @Test
    void theSourcesErrorComesAfterEveryEventBeforeItAndStays() {
        AtomLedgerException refusal = new AtomLedgerException("m.xml:7: entity references are refused");
        try (PipedEventReader piped = new PipedEventReader(new Source(700, refusal), "test-reader")) {
            List<String> seen = new ArrayList<>();
            assertThatThrownBy(() -> {
                while (piped.hasNext()) {
                    seen.add(piped.nextEvent().asStartElement().getName().getLocalPart());
                }
            }).isSameAs(refusal);
            assertThat(seen).hasSize(700).endsWith("e699");
            assertThatThrownBy(piped::hasNext).isSameAs(refusal);
        }
    }

    @Test
    void aMalformedXmlErrorKeepsItsLocationInTheSameWrapperAsTheOneThreadRead() {
        IllegalStateException wrapped = new IllegalStateException(new XMLStreamException("bad"));
        try (PipedEventReader piped = new PipedEventReader(new Source(3, wrapped), "test-reader")) {
            assertThatThrownBy(() -> names(piped)).isSameAs(wrapped);
        }
    }

    @Test
    void closingEarlyStopsTheSourceThread() {
        Source endless = new Source(-1, null);
        try (PipedEventReader piped = new PipedEventReader(endless, "test-reader")) {
            for (int i = 0; i < 3; i++) {
                assertThat(piped.nextEvent().asStartElement().getName().getLocalPart()).isEqualTo("e" + i);
            }
        }
        assertThat(endless.thread.get().isAlive()).isFalse();
    }
}
