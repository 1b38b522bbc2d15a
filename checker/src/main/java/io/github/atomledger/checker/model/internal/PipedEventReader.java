package io.github.atomledger.checker.model.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.NoSuchElementException;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;
import javax.xml.stream.XMLEventReader;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.events.XMLEvent;

/**
 * Reads a source {@link XMLEventReader} to its end on a thread of its own and hands its events, in
 * order and in batches, to the thread that reads this one. {@code ModelLoader} uses it so that
 * decompressing, tokenising and recording (the source, a {@link RecordingEventReader}) run beside
 * JSBML's start-up and its building of the document, on a second core.
 *
 * <p>The events, and so the document JSBML builds, are exactly those of the source. A failure of the
 * source (a {@link RuntimeException}, an {@link Error}, or an {@link XMLStreamException}, wrapped in an
 * {@link IllegalStateException} as {@link RecordingEventReader#hasNext()} does) is thrown by
 * {@link #hasNext()} here after every event before it has been read, and again on every later call,
 * so the first error in document order wins, as in a single-threaded read. {@link #close()} stops
 * the source thread and waits for it; call it always (try-with-resources). Once {@link #hasNext()}
 * has returned false, everything the source recorded is visible to the reading thread.
 *
 * <p>One thread reads this instance; the source is used only by the thread this starts.
 */
public final class PipedEventReader implements EventSource, AutoCloseable {

    private static final int BATCH = 512;
    private static final int QUEUED_BATCHES = 16;
    /** What the source thread hands over: a batch of events, the source's failure, or the end. */
    private sealed interface Item permits Batch, Failure, End {
    }

    private record Batch(List<XMLEvent> events) implements Item {
    }

    private record Failure(Throwable cause) implements Item {
    }

    private record End() implements Item {
    }

    private final BlockingQueue<Item> queue = new ArrayBlockingQueue<>(QUEUED_BATCHES);
    private final Thread producer;
    private List<XMLEvent> batch = List.of();
    private int index;
    private boolean ended;
    private Throwable failure;

    /** Starts reading {@code source} on a new daemon thread named {@code threadName}. */
    public PipedEventReader(XMLEventReader source, String threadName) {
        producer = new Thread(() -> produce(source), threadName);
        producer.setDaemon(true);
        producer.start();
    }

    private void produce(XMLEventReader source) {
        List<XMLEvent> buffer = new ArrayList<>(BATCH);
        try {
            try {
                while (source.hasNext()) {
                    buffer.add(source.nextEvent());
                    if (buffer.size() == BATCH) {
                        queue.put(new Batch(buffer));
                        buffer = new ArrayList<>(BATCH);
                    }
                }
            } catch (RuntimeException | Error | XMLStreamException e) {
                if (!buffer.isEmpty()) {
                    queue.put(new Batch(buffer));
                }
                queue.put(new Failure(e));
                return;
            }
            if (!buffer.isEmpty()) {
                queue.put(new Batch(buffer));
            }
            queue.put(new End());
        } catch (InterruptedException e) {
            // The reading side has closed this reader: nobody wants the rest.
        }
    }

    @Override
    public boolean hasNext() {
        while (index >= batch.size()) {
            if (failure != null) {
                throw rethrown(failure);
            }
            if (ended) {
                return false;
            }
            Item next;
            try {
                next = queue.take();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("interrupted while reading the model", e);
            }
            if (next instanceof Batch b) {
                batch = b.events();
                index = 0;
            } else if (next instanceof Failure f) {
                failure = f.cause();
            } else {
                ended = true;
            }
        }
        return true;
    }

    private static RuntimeException rethrown(Throwable t) {
        if (t instanceof RuntimeException r) {
            throw r;
        }
        if (t instanceof Error e) {
            throw e;
        }
        return new IllegalStateException(t);
    }

    @Override
    public XMLEvent nextEvent() {
        if (!hasNext()) {
            throw new NoSuchElementException("end of the document");
        }
        return batch.get(index++);
    }

    @Override
    public Object next() {
        return nextEvent();
    }

    @Override
    public XMLEvent peek() {
        return hasNext() ? batch.get(index) : null;
    }

    @Override
    public Object getProperty(String name) {
        throw new IllegalArgumentException("no property " + name);
    }

    /** Stops the source thread if it is still running and waits until it has ended. */
    @Override
    public void close() {
        producer.interrupt();
        boolean interrupted = false;
        while (true) {
            try {
                producer.join();
                break;
            } catch (InterruptedException e) {
                interrupted = true;
            }
        }
        if (interrupted) {
            Thread.currentThread().interrupt();
        }
    }
}
