package io.github.atomledger.atommapper.structure.internal;

import java.util.Objects;
import java.util.function.Supplier;

/**
 * A value computed on first use and then kept; safe to share between threads. The computation
 * runs at most once, under a lock, because the CDK calls behind it read shared containers.
 */
public final class Lazy<T> implements Supplier<T> {

    private final Supplier<T> compute;
    private volatile T value;

    public Lazy(Supplier<T> compute) {
        this.compute = Objects.requireNonNull(compute);
    }

    @Override
    public T get() {
        T v = value;
        if (v == null) {
            synchronized (this) {
                v = value;
                if (v == null) {
                    v = Objects.requireNonNull(compute.get());
                    value = v;
                }
            }
        }
        return v;
    }
}
