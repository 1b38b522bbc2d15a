package io.github.atomledger.checker.engine;

import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.StandardChecks;
import io.github.atomledger.checker.check.balance.BalanceCalculator;
import io.github.atomledger.checker.check.balance.ReactionBalance;
import io.github.atomledger.checker.check.balance.ReactionClass;
import io.github.atomledger.checker.check.balance.SpeciesChemistry;
import io.github.atomledger.checker.check.mapping.MappingData;
import io.github.atomledger.checker.model.LoadOptions;
import io.github.atomledger.checker.model.ModelLoader;
import io.github.atomledger.checker.model.ModelView;
import io.github.atomledger.checker.model.ReactionInfo;
import io.github.atomledger.checker.trace.Pathway;
import io.github.atomledger.checker.trace.TraceInputs;
import io.github.atomledger.checker.trace.TraceResults;
import io.github.atomledger.checker.trace.Traces;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Runs every check on every model of a {@link RunConfig}. Read-only: it never writes a model.
 *
 * <p>Usage:
 * <pre>{@code
 * RunResult result = new Engine().run(RunConfig.defaults(dir, List.of("models/**.xml")), RunListener.SILENT);
 * result.failing().forEach(System.out::println);
 * }</pre>
 *
 * <p>Problems in a model are findings. A broken input (missing file, malformed XML, not SBML)
 * throws {@link AtomLedgerException}; a check that throws is wrapped with its rule id and the
 * model file and stops the run. Thread-safe; deterministic (same input, same result).
 */
public final class Engine {

    private final List<ModelCheck> checks;

    public Engine() {
        this(StandardChecks.all());
    }

    public Engine(List<ModelCheck> checks) {
        this.checks = List.copyOf(checks);
    }

    public List<ModelCheck> checks() {
        return checks;
    }

    /**
     * The model files a configuration names, in the order a run reads them.
     *
     * @throws AtomLedgerException when a pattern matches no file (as {@link #run} would)
     */
    public static List<Path> modelFiles(RunConfig config) {
        return ModelLocator.locate(config.baseDirectory(), config.models());
    }

    public RunResult run(RunConfig config, RunListener listener) {
        List<Path> files = ModelLocator.locate(config.baseDirectory(), config.models());
        ModelLoader loader = new ModelLoader(new LoadOptions(config.maxModelBytes()));
        TraceInputs traces = traceInputs(config, listener);
        List<ModelResult> results = new ArrayList<>();
        for (Path file : files) {
            String display = ModelLocator.relative(config.baseDirectory(), file);
            listener.debug("reading " + display);
            ModelView model = loader.load(file, display);
            results.add(check(model, file, config, listener, traces));
        }
        warnUntraced(traces, results, listener);
        return new RunResult(config, results);
    }

    /** The pathways, fates and label sources to trace; none (with a warning) when mapping is off. */
    private static TraceInputs traceInputs(RunConfig config, RunListener listener) {
        if (!config.traces().active()) {
            return TraceInputs.NONE;
        }
        TraceInputs inputs = TraceInputs.load(config.traces(), config.baseDirectory());
        if (!config.mapping().enabled()) {
            listener.warn("pathways, fates and tracers need atom maps: set structures (or mapping=on); nothing is traced");
            return TraceInputs.NONE;
        }
        return inputs;
    }

    private static void warnUntraced(TraceInputs traces, List<ModelResult> results, RunListener listener) {
        for (Pathway p : traces.pathways()) {
            boolean traced = results.stream().anyMatch(m -> m.traces().pathways().stream()
                    .anyMatch(t -> t.pathway().name().equals(p.name())));
            if (!traced) {
                listener.warn("pathway " + p.name() + " (" + p.where() + "): "
                        + (p.model().isEmpty() ? "no model checked has its source " + p.source()
                        : "its model " + p.model() + " was not checked") + "; not traced");
            }
        }
    }

    /** Checks one loaded model without atom mapping. */
    public ModelResult check(ModelView model, SeverityPolicy policy) {
        return check(model, null, policy, MappingConfig.OFF, RunListener.SILENT, null, 0, TraceInputs.NONE);
    }

    private ModelResult check(ModelView model, Path file, RunConfig config, RunListener listener, TraceInputs traces) {
        return check(model, file, config.policy(), config.mapping(), listener, config.baseDirectory(), config.maxModelBytes(),
                traces);
    }

    private ModelResult check(ModelView model, Path file, SeverityPolicy policy, MappingConfig mappingConfig,
                              RunListener listener, Path base, long maxBytes, TraceInputs traceInputs) {
        BalanceCalculator calculator = new BalanceCalculator();
        Map<String, SpeciesChemistry> chemistry = calculator.chemistry(model);
        Map<String, ReactionBalance> balances = calculator.balances(model, chemistry);
        boolean mapped = mappingConfig.enabled() && file != null;
        // Checks that do not read atom maps run on a second thread while the maps are computed
        // or read from the cache (a warm yeast-GEM run spends as long on each); see DEVELOPERS.md.
        EarlyChecks early = mapped ? EarlyChecks.start(checks, policy,
                CheckContext.whileMapping(model, chemistry, balances)) : EarlyChecks.NONE;
        MappingData mapping = mapped
                ? new MappingStage(mappingConfig, base, maxBytes, listener).run(model, file, balances)
                : MappingData.NONE;
        CheckContext context = new CheckContext(model, chemistry, balances, mapping);
        Map<ModelCheck, EarlyChecks.Outcome> earlyOutcomes = early.outcomes();

        Map<String, List<Finding>> byReaction = new HashMap<>();
        List<Finding> modelFindings = new ArrayList<>();
        for (ModelCheck check : checks) {
            if (policy.switchedOff(check.ruleId())) {
                continue;
            }
            List<Finding> found;
            try {
                EarlyChecks.Outcome done = earlyOutcomes.get(check);
                found = done != null ? done.get() : check.check(context);
            } catch (RuntimeException e) {
                throw new AtomLedgerException(model.file() + ": check " + check.ruleId() + " failed: " + AtomLedgerException.reason(e), e);
            }
            for (Finding f : found) {
                ReactionBalance b = balances.get(f.elementId());
                boolean reactionFinding = b != null;
                ReactionClass cls = reactionFinding ? b.reactionClass() : null;
                policy.apply(f, cls).ifPresent(applied -> {
                    if (reactionFinding) {
                        byReaction.computeIfAbsent(applied.elementId(), k -> new ArrayList<>()).add(applied);
                    } else {
                        modelFindings.add(applied);
                    }
                });
            }
        }
        // Traces walk the maps after the checks: model -> maps -> checks and traces -> reports.
        TraceResults traces = Traces.run(model, mapping, traceInputs);
        for (Finding f : traces.findings()) {
            if (!policy.switchedOff(f.ruleId())) {
                policy.apply(f, null).ifPresent(modelFindings::add);
            }
        }
        List<ReactionResult> reactions = new ArrayList<>();
        java.util.Set<String> done = new java.util.HashSet<>();
        for (ReactionInfo r : model.reactions()) {
            if (!done.add(r.id())) {
                continue;
            }
            reactions.add(new ReactionResult(r, balances.get(r.id()), byReaction.getOrDefault(r.id(), List.of()),
                    mapping.mapping(r.id()).orElse(null)));
        }
        return new ModelResult(model, reactions, modelFindings, mapping, traces);
    }
}
