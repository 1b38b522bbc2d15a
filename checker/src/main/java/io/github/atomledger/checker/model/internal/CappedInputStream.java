package io.github.atomledger.checker.model.internal;

import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;

/** Stops reading with an IOException once more than {@code cap} bytes have been read. */
public final class CappedInputStream extends FilterInputStream {

    private final long cap;
    private long count;

    public CappedInputStream(InputStream in, long cap) {
        super(in);
        this.cap = cap;
    }

    @Override
    public int read() throws IOException {
        int b = super.read();
        if (b >= 0) {
            add(1);
        }
        return b;
    }

    @Override
    public int read(byte[] b, int off, int len) throws IOException {
        int n = super.read(b, off, len);
        if (n > 0) {
            add(n);
        }
        return n;
    }

    private void add(long n) throws IOException {
        count += n;
        if (count > cap) {
            throw new SizeCapException(cap);
        }
    }

    /** Thrown when the cap is passed. */
    public static final class SizeCapException extends IOException {
        private static final long serialVersionUID = 1L;
        private final long cap;

        SizeCapException(long cap) {
            super("decompressed size exceeds the cap of " + cap + " bytes");
            this.cap = cap;
        }

        public long cap() {
            return cap;
        }
    }
}
