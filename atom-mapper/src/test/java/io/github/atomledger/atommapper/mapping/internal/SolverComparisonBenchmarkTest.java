package io.github.atomledger.atommapper.mapping.internal;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.mapping.MappingOptions;
import io.github.atomledger.atommapper.mapping.Participant;
import io.github.atomledger.atommapper.structure.Structure;
import io.github.atomledger.atommapper.structure.StructureException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.ojalgo.optimisation.Expression;
import org.ojalgo.optimisation.ExpressionsBasedModel;
import org.ojalgo.optimisation.Optimisation;
import org.ojalgo.optimisation.Variable;

/**
 * Benchmark behind the solver decision (README, "Solver"): the same minimum weighted bond-edit
 * problem as an integer program in ojalgo (assignment variables plus preserved-bond variables, a
 * linearisation in the spirit of First, Gounaris &amp; Floudas 2012) against {@link Search}. Prints
 * times and optimal costs; asserts only that both agree where both finish. Run with -Pbench.
 */
@Tag("bench")
class SolverComparisonBenchmarkTest {

    private static final String COA = "SCCNC(=O)CCNC(=O)C(O)C(C)(C)COP(=O)(O)OP(=O)(O)OCC1OC(C(O)C1OP(=O)(O)O)n1cnc2c(N)ncnc12";

    @Test
    void comparesBranchAndBoundWithMixedIntegerProgram() throws Exception {
        String[][] cases = {
            {"TPI", "OCC(=O)COP(=O)(O)O", "O=CC(O)COP(=O)(O)O"},
            {"SDH", "OC(=O)CCC(=O)O", "OC(=O)C=CC(=O)O"},
            {"ICL", "OC(=O)CC(C(O)C(=O)O)C(=O)O", "OC(=O)CCC(=O)O.O=CC(=O)O"},
            {"PGI", "OC1OC(COP(=O)(O)O)C(O)C(O)C1O", "OCC1(O)OC(COP(=O)(O)O)C(O)C1O"},
            {"TALA", "OCC(=O)C(O)C(O)C(O)C(O)COP(=O)(O)O.O=CC(O)COP(=O)(O)O",
                "O=CC(O)C(O)COP(=O)(O)O.OCC1(O)OC(COP(=O)(O)O)C(O)C1O"},
            {"PDH", "CC(=O)C(=O)O." + COA, "CC(=O)" + COA + ".O=C=O"},
            {"CS", "CC(=O)" + COA + ".OC(=O)CC(=O)C(=O)O.O", "OC(=O)CC(O)(CC(=O)O)C(=O)O." + COA},
        };
        MappingOptions options = MappingOptions.defaults();
        StringBuilder report = new StringBuilder("reaction | heavy atoms | B&B ms | B&B cost | MIP ms | MIP cost/state\n");
        for (String[] c : cases) {
            Map<String, Integer> elements = new HashMap<>();
            Map<String, Integer> orbits = new HashMap<>();
            SideGraph r = new SideGraph(side(c[1]), elements, orbits);
            SideGraph p = new SideGraph(side(c[2]), elements, orbits);
            long t0 = System.nanoTime();
            int[] pins = new int[r.atomCount()];
            java.util.Arrays.fill(pins, -1);
            Search search = new Search(r, p, options, pins, System.nanoTime() + 60_000_000_000L);
            boolean proven = search.optimise();
            long bb = (System.nanoTime() - t0) / 1_000_000;
            t0 = System.nanoTime();
            Optimisation.Result mip = solveMip(r, p, options);
            long mipMs = (System.nanoTime() - t0) / 1_000_000;
            report.append(c[0]).append(" | ").append(r.atomCount()).append(" | ").append(bb).append(" | ")
                    .append(search.upper()).append(proven ? "" : " (not proven)").append(" | ").append(mipMs).append(" | ")
                    .append(Math.round(mip.getValue())).append(' ').append(mip.getState()).append('\n');
            if (proven && mip.getState().isOptimal()) {
                assertThat(Math.round(mip.getValue())).isEqualTo(search.upper());
            }
        }
        System.out.print(report);
    }

    private static List<Participant> side(String dotted) throws StructureException {
        List<Participant> out = new ArrayList<>();
        int k = 0;
        for (String smiles : dotted.split("\\.")) {
            out.add(new Participant("m" + k++, Structure.fromSmiles(smiles), 1));
        }
        return out;
    }

    private static Optimisation.Result solveMip(SideGraph r, SideGraph p, MappingOptions o) {
        ExpressionsBasedModel model = new ExpressionsBasedModel();
        model.options.time_abort = 60_000L;
        int n = r.atomCount();
        Variable[][] y = new Variable[n][n];
        for (int u = 0; u < n; u++) {
            for (int x = 0; x < n; x++) {
                if (r.element(u).equals(p.element(x))) {
                    y[u][x] = model.addVariable("y" + u + "_" + x).binary();
                }
            }
        }
        for (int u = 0; u < n; u++) {
            Expression row = model.addExpression("r" + u).level(1);
            Expression col = model.addExpression("c" + u).level(1);
            for (int x = 0; x < n; x++) {
                if (y[u][x] != null) {
                    row.set(y[u][x], 1);
                }
                if (y[x][u] != null) {
                    col.set(y[x][u], 1);
                }
            }
        }
        double constant = 0;
        // Reactant bond (u,v) preserved (pr) and preserved with its order (ps): if u -> x then v must
        // go to a neighbour of x (of the same order, for ps).
        for (int u = 0; u < n; u++) {
            for (int v : r.neighbours(u)) {
                if (u > v) {
                    continue;
                }
                int wb = o.bondWeight(r.element(u), r.element(v));
                constant += wb;
                Variable pr = model.addVariable("pr" + u + "_" + v).lower(0).upper(1).weight(-(wb - o.orderChangeWeight()));
                Variable ps = model.addVariable("ps" + u + "_" + v).lower(0).upper(1).weight(-o.orderChangeWeight());
                model.addExpression("s" + u + "_" + v).upper(0).set(ps, 1).set(pr, -1);
                for (int x = 0; x < n; x++) {
                    if (y[u][x] == null) {
                        continue;
                    }
                    Expression e1 = model.addExpression("a" + u + "_" + v + "_" + x).upper(1).set(pr, 1).set(y[u][x], 1);
                    Expression e2 = model.addExpression("b" + u + "_" + v + "_" + x).upper(1).set(ps, 1).set(y[u][x], 1);
                    for (int xn : p.neighbours(x)) {
                        if (y[v][xn] != null) {
                            e1.set(y[v][xn], -1);
                            if (p.bond(x, xn) == r.bond(u, v)) {
                                e2.set(y[v][xn], -1);
                            }
                        }
                    }
                }
            }
        }
        for (int x = 0; x < n; x++) {
            for (int z : p.neighbours(x)) {
                if (x > z) {
                    continue;
                }
                int wf = o.bondWeight(p.element(x), p.element(z));
                constant += wf;
                Variable q = model.addVariable("q" + x + "_" + z).lower(0).upper(1).weight(-wf);
                for (int u = 0; u < n; u++) {
                    if (y[u][x] == null) {
                        continue;
                    }
                    Expression e = model.addExpression("f" + x + "_" + z + "_" + u).upper(1).set(q, 1).set(y[u][x], 1);
                    for (int un : r.neighbours(u)) {
                        if (y[un][z] != null) {
                            e.set(y[un][z], -1);
                        }
                    }
                }
            }
        }
        Optimisation.Result result = model.minimise();
        return new Optimisation.Result(result.getState(), result.getValue() + constant, result);
    }
}
