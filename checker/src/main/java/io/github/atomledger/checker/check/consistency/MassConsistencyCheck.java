package io.github.atomledger.checker.check.consistency;

import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.Wording;
import io.github.atomledger.checker.check.CheckContext;
import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.ModelCheck;
import io.github.atomledger.checker.check.Severity;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.StringJoiner;
import java.util.TreeMap;

/**
 * The stoichiometric consistency test (Gevorgyan, Poolman &amp; Fell 2008), formulas or not, in
 * two rules that share one analysis per model ({@link CheckContext#shared}):
 * <ul>
 *   <li>{@code balance.mass-inconsistent}: the internal reactions admit no strictly positive mass
 *       vector that they all conserve; some combination of reactions makes matter from nothing.
 *       One model-level finding. Data: {@code metabolites} and {@code reactions} (network size),
 *       {@code unconservedCount}, {@code unconserved} (comma list), {@code causingReactions}
 *       (comma list), {@code fluxes} ({@code r=coefficient} comma list), {@code net}
 *       ({@code species=amount} comma list), {@code verification} (see
 *       {@link ConsistencyResult#verification()}).</li>
 *   <li>{@code balance.consistency-undecided}: the test ran out of its time budget, so nothing is
 *       known; data {@code metabolites}, {@code reactions}, {@code budgetMs}.</li>
 * </ul>
 * Switching {@code balance.mass-inconsistent} off skips the analysis (and so both rules).
 * See {@link StoichiometricConsistency}.
 */
public final class MassConsistencyCheck implements ModelCheck {

    /** The rule of an inconsistent network. */
    public static final String INCONSISTENT = "balance.mass-inconsistent";
    /** The rule of an analysis that ran out of its budget. */
    public static final String UNDECIDED = "balance.consistency-undecided";

    /** At most this many ids are named in the message; the data lists all. */
    private static final int SHOWN = 5;

    private static final StoichiometricConsistency ANALYSIS = new StoichiometricConsistency();

    private final boolean undecided;
    private final StoichiometricConsistency analysis;

    MassConsistencyCheck(boolean undecided, StoichiometricConsistency analysis) {
        this.undecided = undecided;
        this.analysis = analysis;
    }

    /** {@code balance.mass-inconsistent}. */
    public static MassConsistencyCheck inconsistent() {
        return new MassConsistencyCheck(false, ANALYSIS);
    }

    /** {@code balance.consistency-undecided}. */
    public static MassConsistencyCheck undecided() {
        return new MassConsistencyCheck(true, ANALYSIS);
    }

    @Override
    public String ruleId() {
        return undecided ? UNDECIDED : INCONSISTENT;
    }

    @Override
    public String description() {
        return undecided ? "The stoichiometric consistency test could not settle every metabolite (time budget, or no exact proof)."
                : "The internal reactions cannot all conserve any positive mass assignment (stoichiometric inconsistency).";
    }

    @Override
    public Severity defaultSeverity() {
        return undecided ? Severity.WARNING : Severity.ERROR;
    }

    @Override
    public List<Finding> check(CheckContext context) {
        ConsistencyResult r = context.shared(ConsistencyResult.class, () -> analysis.analyse(context));
        if (undecided) {
            return r.undecided() || !r.undetermined().isEmpty() ? List.of(undecidedFinding(context, r)) : List.of();
        }
        if (r.consistent()) {
            return List.of();
        }
        Map<String, String> data = new TreeMap<>();
        data.put("metabolites", Integer.toString(r.metabolites()));
        data.put("reactions", Integer.toString(r.reactions()));
        data.put("unconservedCount", Integer.toString(r.unconserved().size()));
        data.put("unconserved", String.join(",", r.unconserved()));
        data.put("causingReactions", String.join(",", r.causingReactions()));
        data.put("fluxes", pairs(r.fluxes()));
        data.put("net", pairs(r.net()));
        data.put("verification", r.verification());
        data.put("undetermined", String.join(",", r.undetermined()));
        String id = context.model().modelId();
        String message = "The internal reactions are stoichiometrically inconsistent: "
                + Wording.count(r.unconserved().size(), "metabolite") + " cannot"
                + " be given a conserved positive mass (" + shown(new ArrayList<>(r.unconserved()))
                + "); reactions " + shown(r.causingReactions()) + " together make " + shown(describe(r.net()))
                + " from nothing.";
        return List.of(context.finding(this, id, 0, message, data));
    }

    private Finding undecidedFinding(CheckContext context, ConsistencyResult r) {
        Map<String, String> data = new TreeMap<>();
        data.put("metabolites", Integer.toString(r.metabolites()));
        data.put("reactions", Integer.toString(r.reactions()));
        data.put("budgetMs", Long.toString(analysis.budgetMillis()));
        data.put("undeterminedCount", Integer.toString(r.undetermined().size()));
        data.put("undetermined", String.join(",", r.undetermined()));
        String message = r.undecided()
                ? "The stoichiometric consistency of " + r.reactions() + " internal reactions over " + r.metabolites()
                        + " metabolites could not be decided within the solver's budget of "
                        + analysis.budgetMillis() + " ms per LP."
                : "The stoichiometric consistency of " + Wording.count(r.undetermined().size(), "metabolite") + " could not be proven either"
                        + " way (" + shown(new ArrayList<>(r.undetermined())) + ").";
        return context.finding(this, context.model().modelId(), 0, message, data);
    }

    private static String pairs(Map<String, Rational> m) {
        StringJoiner j = new StringJoiner(",");
        m.forEach((k, v) -> j.add(k + "=" + v));
        return j.toString();
    }

    private static List<String> describe(Map<String, Rational> net) {
        List<String> out = new ArrayList<>();
        net.forEach((k, v) -> out.add(v.toDecimalString() + " " + k));
        return out;
    }

    private static String shown(List<String> ids) {
        if (ids.isEmpty()) {
            return "none found";
        }
        return Wording.shortList(ids, SHOWN);
    }
}
