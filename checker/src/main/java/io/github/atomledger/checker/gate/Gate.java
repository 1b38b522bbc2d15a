package io.github.atomledger.checker.gate;

import io.github.atomledger.checker.baseline.Baseline;
import io.github.atomledger.checker.baseline.BaselineMatch;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.balance.ReactionClass;
import io.github.atomledger.checker.diff.CarbonTransitions;
import io.github.atomledger.checker.diff.ReleaseDiff;
import io.github.atomledger.checker.diff.StoredTransitions;
import io.github.atomledger.checker.engine.BaselineStatus;
import io.github.atomledger.checker.engine.Engine;
import io.github.atomledger.checker.engine.GateMarks;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;
import io.github.atomledger.checker.engine.RunListener;
import io.github.atomledger.checker.engine.RunResult;
import io.github.atomledger.checker.engine.SeverityPolicy;
import io.github.atomledger.checker.model.LoadOptions;
import io.github.atomledger.checker.model.ModelLoader;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * The release gate on top of a check run: compares each model with its previous release
 * ({@link ReleaseDiff}), matches the findings against the committed {@link Baseline}, and marks
 * which findings may fail the build ({@link GateMarks}). The severity policy of the run applies
 * to the gate's own findings too.
 *
 * <p>Usage:
 * <pre>{@code
 * RunResult checked = engine.run(config, listener);
 * RunResult gated = Gate.standard(engine, config.maxModelBytes()).apply(checked, gateConfig, listener);
 * gated.failing();   // new findings only
 * }</pre>
 *
 * <p>Read-only: it never writes a model or the baseline. Deterministic and thread-safe. A
 * malformed baseline or a previous model that cannot be read throws
 * {@link io.github.atomledger.checker.AtomLedgerException} naming the file.
 */
public final class Gate {

    private final Engine engine;
    private final CarbonTransitions carbons;

    /**
     * @param engine  checks the previous release's models, with the same checks as the run
     * @param carbons where carbon transitions come from
     */
    public Gate(Engine engine, CarbonTransitions carbons) {
        this.engine = engine;
        this.carbons = carbons;
    }

    /**
     * A gate taking each reaction's carbon transitions from the model file's annotation (what the
     * release ships), else from the atom map computed in the run, when mapping was on.
     */
    public static Gate standard(Engine engine, long maxModelBytes) {
        return new Gate(engine, CarbonTransitions.firstOf(new StoredTransitions(maxModelBytes), CarbonTransitions.COMPUTED));
    }

    /** The gate's own rule ids (stale baseline entries and the release diff), sorted. */
    public static Set<String> ruleIds() {
        Set<String> ids = new TreeSet<>(ReleaseDiff.RULES.keySet());
        ids.add(BaselineMatch.STALE_RULE);
        return ids;
    }

    /** Applies the release diff, the baseline and the fail scope. */
    public RunResult apply(RunResult run, GateConfig gate, RunListener listener) {
        RunResult diffed = gate.previousModels() == null ? run : withReleaseDiff(run, gate.previousModels(), listener);
        Map<Finding, BaselineStatus> statuses = Map.of();
        String display = "";
        RunResult out = diffed;
        if (gate.usesBaseline()) {
            display = relative(run.config().baseDirectory(), gate.baseline());
            Baseline baseline = Baseline.read(gate.baseline(), display);
            BaselineMatch match = BaselineMatch.of(baseline, display, diffed.allFindings(), files(diffed));
            out = attach(diffed, match.stale(), false);
            statuses = match.statuses();
            listener.info("baseline " + display + ": " + match.count(BaselineStatus.ACCEPTED) + " accepted, "
                    + match.count(BaselineStatus.PENDING_REASON) + " without a reason, " + match.stale().size() + " stale");
            if (match.count(BaselineStatus.PENDING_REASON) > 0) {
                listener.warn("baseline " + display + ": entries whose reason is empty or starts with '"
                        + Baseline.PLACEHOLDER_PREFIX + "' accept nothing; write the reason to accept them");
            }
        }
        Set<String> only = gate.failOn() == FailScope.REGRESSIONS ? ReleaseDiff.RULES.keySet() : Set.of();
        return new RunResult(out.config(), out.models(), new GateMarks(display, statuses, only));
    }

    /**
     * The run with the release diff's findings added to each model.
     *
     * @param previous a directory holding the previous release's models under the same relative
     *                 paths, or a single file when the run checked one model
     */
    public RunResult withReleaseDiff(RunResult run, Path previous, RunListener listener) {
        Path base = run.config().baseDirectory();
        boolean single = Files.isRegularFile(previous);
        if (single && run.models().size() != 1) {
            throw new IllegalArgumentException("previousModels: " + relative(base, previous) + " is one file, but "
                    + run.models().size() + " models were checked; give a directory that holds the previous"
                    + " models under the same paths");
        }
        ModelLoader loader = new ModelLoader(new LoadOptions(run.config().maxModelBytes()));
        SeverityPolicy policy = run.config().policy();
        List<Finding> found = new ArrayList<>();
        for (ModelResult current : run.models()) {
            Path old = single ? previous : previous.resolve(current.file());
            Map<String, List<io.github.atomledger.atommapper.mapping.AtomTransition>> now =
                    carbons.carbons(current, base.resolve(current.file()));
            if (!Files.isRegularFile(old)) {
                listener.info(current.file() + ": no previous version (" + relative(base, old)
                        + "); every reaction counts as new");
                found.addAll(ReleaseDiff.compare(null, current, Map.of(), now));
                continue;
            }
            String oldDisplay = relative(base, old);
            listener.debug("reading previous release " + oldDisplay);
            ModelResult before = engine.check(loader.load(old, oldDisplay), policy);
            found.addAll(ReleaseDiff.compare(before, current, carbons.carbons(before, old), now));
        }
        return attach(run, found, true);
    }

    /**
     * Adds findings to their models, after the severity policy; findings about a reaction go to
     * that reaction when {@code toReactions}, others to the model.
     */
    private static RunResult attach(RunResult run, List<Finding> extra, boolean toReactions) {
        SeverityPolicy policy = run.config().policy();
        List<ModelResult> models = new ArrayList<>();
        for (ModelResult m : run.models()) {
            Map<String, ReactionClass> classes = new HashMap<>();
            m.reactions().forEach(r -> classes.putIfAbsent(r.id(), r.reactionClass()));
            Map<String, List<Finding>> byReaction = new HashMap<>();
            List<Finding> modelLevel = new ArrayList<>(m.modelFindings());
            for (Finding f : extra) {
                if (!f.modelFile().equals(m.file())) {
                    continue;
                }
                ReactionClass cls = classes.get(f.elementId());
                policy.apply(f, cls).ifPresent(applied -> {
                    if (toReactions && cls != null) {
                        byReaction.computeIfAbsent(applied.elementId(), k -> new ArrayList<>()).add(applied);
                    } else {
                        modelLevel.add(applied);
                    }
                });
            }
            List<ReactionResult> reactions = new ArrayList<>();
            for (ReactionResult r : m.reactions()) {
                List<Finding> more = byReaction.remove(r.id());
                if (more == null) {
                    reactions.add(r);
                } else {
                    List<Finding> all = new ArrayList<>(r.findings());
                    all.addAll(more);
                    reactions.add(new ReactionResult(r.reaction(), r.balance(), all, r.mapping()));
                }
            }
            models.add(new ModelResult(m.model(), reactions, modelLevel, m.mapping(), m.traces()));
        }
        return new RunResult(run.config(), models, run.gate());
    }

    private static List<String> files(RunResult run) {
        return run.models().stream().map(ModelResult::file).toList();
    }

    static String relative(Path base, Path file) {
        Path abs = file.toAbsolutePath().normalize();
        Path b = base.toAbsolutePath().normalize();
        return (abs.startsWith(b) ? b.relativize(abs).toString() : abs.toString()).replace('\\', '/');
    }
}
