package io.github.atomledger.checker.engine;

import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;

import java.util.ArrayList;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;

/**
 * The checks of one model that do not read atom maps (every area but {@code mapping} and
 * {@code structure}), run on a thread of their own while the engine maps the model. Their
 * outcomes are the same as run after mapping: the context they get refuses to hand out maps
 * ({@link CheckContext#whileMapping}), so a check that reads them anyway fails loudly instead of
 * seeing none. Outcomes are taken in the engine's check order, so findings stay deterministic.
 */
final class EarlyChecks {

    static final EarlyChecks NONE = new EarlyChecks(null);

    /** What one check gave: its findings, or the exception it threw. */
    record Outcome(List<Finding> findings, RuntimeException error) {

        /** The findings, or the check's exception thrown again. */
        List<Finding> get() {
            if (error != null) {
                throw error;
            }
            return findings;
        }
    }

    private final CompletableFuture<Map<ModelCheck, Outcome>> outcomes;

    private EarlyChecks(CompletableFuture<Map<ModelCheck, Outcome>> outcomes) {
        this.outcomes = outcomes;
    }

    /** True for the checks that read atom maps or structures: they wait for the maps. */
    static boolean needsMaps(ModelCheck check) {
        return check.ruleId().startsWith("mapping.") || check.ruleId().startsWith("structure.");
    }

    static EarlyChecks start(List<ModelCheck> checks, SeverityPolicy policy, CheckContext context) {
        List<ModelCheck> early = new ArrayList<>();
        for (ModelCheck c : checks) {
            if (!needsMaps(c) && !policy.switchedOff(c.ruleId())) {
                early.add(c);
            }
        }
        CompletableFuture<Map<ModelCheck, Outcome>> f = new CompletableFuture<>();
        Thread t = new Thread(() -> {
            Map<ModelCheck, Outcome> out = new IdentityHashMap<>();
            try {
                for (ModelCheck c : early) {
                    try {
                        out.put(c, new Outcome(c.check(context), null));
                    } catch (RuntimeException e) {
                        out.put(c, new Outcome(null, e));
                    }
                }
                f.complete(out);
            } catch (Error e) {
                f.completeExceptionally(e);
            }
        }, "atomledger-checks");
        t.setDaemon(true);
        t.start();
        return new EarlyChecks(f);
    }

    /** The outcome of each early check; empty for {@link #NONE}. */
    Map<ModelCheck, Outcome> outcomes() {
        if (outcomes == null) {
            return Map.of();
        }
        try {
            return outcomes.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while checking", e);
        } catch (ExecutionException e) {
            throw (Error) e.getCause();
        }
    }
}
