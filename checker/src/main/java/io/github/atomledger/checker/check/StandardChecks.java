package io.github.atomledger.checker.check;

import io.github.atomledger.checker.check.balance.AbsentChemistryCheck;
import io.github.atomledger.checker.check.balance.ChargeBalanceCheck;
import io.github.atomledger.checker.check.balance.CommonCauseCheck;
import io.github.atomledger.checker.check.balance.ChargeSyntaxCheck;
import io.github.atomledger.checker.check.balance.ClassMismatchCheck;
import io.github.atomledger.checker.check.balance.ElementBalanceCheck;
import io.github.atomledger.checker.check.balance.ExemptReactionCheck;
import io.github.atomledger.checker.check.balance.FormulaSyntaxCheck;
import io.github.atomledger.checker.check.balance.MissingChemistryCheck;
import io.github.atomledger.checker.check.balance.NotComputableCheck;
import io.github.atomledger.checker.check.balance.PolymerFormulaCheck;
import io.github.atomledger.checker.check.balance.SymbolCheck;
import io.github.atomledger.checker.check.consistency.MassConsistencyCheck;
import io.github.atomledger.checker.check.integrity.DuplicateIdCheck;
import io.github.atomledger.checker.check.structure.StructureFormulaCheck;
import io.github.atomledger.checker.check.integrity.ReactionShapeCheck;
import io.github.atomledger.checker.check.integrity.ReferenceCheck;

import io.github.atomledger.checker.check.mapping.CuratedMapCheck;
import io.github.atomledger.checker.check.mapping.MappingReviewCheck;
import io.github.atomledger.checker.check.mapping.MappingStatusCheck;
import io.github.atomledger.checker.check.mapping.StaleMapCheck;
import io.github.atomledger.checker.check.mapping.StructureMissingCheck;
import io.github.atomledger.checker.check.mapping.GenericSpeciesCheck;
import io.github.atomledger.checker.check.mapping.CuratedFileCheck;
import io.github.atomledger.checker.check.mapping.StructureSourceCheck;

import java.util.ArrayList;
import java.util.List;

/** The registry: every check AtomLedger runs, listed explicitly. No classpath scanning. */
public final class StandardChecks {

    private StandardChecks() {
    }

    /** All checks in a fixed order; rule ids are unique. */
    public static List<ModelCheck> all() {
        List<ModelCheck> all = new ArrayList<>(List.of(
                new DuplicateIdCheck(),
                new ReferenceCheck(),
                new ReactionShapeCheck(),
                new FormulaSyntaxCheck(),
                new ChargeSyntaxCheck(),
                new SymbolCheck(),
                MissingChemistryCheck.formula(),
                MissingChemistryCheck.charge(),
                AbsentChemistryCheck.formulas(),
                AbsentChemistryCheck.charges(),
                new ElementBalanceCheck(),
                new ChargeBalanceCheck(),
                new CommonCauseCheck(),
                new NotComputableCheck(),
                new PolymerFormulaCheck(),
                new ExemptReactionCheck(),
                new ClassMismatchCheck(),
                MassConsistencyCheck.inconsistent(),
                MassConsistencyCheck.undecided(),
                StructureFormulaCheck.mismatch(),
                StructureFormulaCheck.protonation()));
        all.addAll(StructureSourceCheck.all());
        all.add(new StructureMissingCheck());
        all.add(new GenericSpeciesCheck());
        all.addAll(MappingStatusCheck.all());
        all.addAll(CuratedMapCheck.all());
        all.add(new CuratedFileCheck());
        all.addAll(MappingReviewCheck.all());
        all.add(new StaleMapCheck());
        return List.copyOf(all);
    }
}
