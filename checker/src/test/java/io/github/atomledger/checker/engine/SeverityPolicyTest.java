package io.github.atomledger.checker.engine;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;
import io.github.atomledger.checker.check.StandardChecks;
import io.github.atomledger.checker.check.balance.ReactionClass;

import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

class SeverityPolicyTest {

    private static Finding finding(String rule, Severity severity) {
        return new Finding(rule, severity, "models/x.xml", "R_X", 3, "m", new TreeMap<>());
    }

    private static SeverityPolicy policy(Map<String, String> rules, Map<String, String> classes) {
        return SeverityPolicy.of(rules, classes, StandardChecks.all());
    }

    @Test
    void defaultsKeepTheCheckSeverityAndLowerBiomassAndPseudoBalanceFindingsToInfo() {
        SeverityPolicy p = SeverityPolicy.defaults();
        assertThat(p.apply(finding("balance.elements", Severity.ERROR), ReactionClass.INTERNAL))
                .hasValueSatisfying(f -> assertThat(f.severity()).isEqualTo(Severity.ERROR));
        assertThat(p.apply(finding("balance.elements", Severity.ERROR), ReactionClass.BIOMASS))
                .hasValueSatisfying(f -> assertThat(f.severity()).isEqualTo(Severity.INFO));
        assertThat(p.apply(finding("balance.charge", Severity.ERROR), ReactionClass.PSEUDO))
                .hasValueSatisfying(f -> assertThat(f.severity()).isEqualTo(Severity.INFO));
        assertThat(p.apply(finding("model.reaction-shape", Severity.WARNING), ReactionClass.BIOMASS))
                .hasValueSatisfying(f -> assertThat(f.severity()).isEqualTo(Severity.WARNING));
    }

    @Test
    void ruleOverrideSetsSeverityOrSwitchesTheRuleOff() {
        SeverityPolicy p = policy(Map.of("balance.charge", "Warning", "model.formula-missing", " off "), Map.of());
        assertThat(p.apply(finding("balance.charge", Severity.ERROR), ReactionClass.INTERNAL))
                .hasValueSatisfying(f -> assertThat(f.severity()).isEqualTo(Severity.WARNING));
        assertThat(p.apply(finding("model.formula-missing", Severity.WARNING), null)).isEmpty();
        assertThat(p.ruleOverrides()).containsExactlyEntriesOf(new TreeMap<>(Map.of("balance.charge", "warning",
                "model.formula-missing", "off")));
    }

    @Test
    void classOverrideWinsOverRuleOverrideForBalanceFindingsOnly() {
        SeverityPolicy p = policy(Map.of("balance.elements", "warning", "model.reaction-shape", "error"),
                Map.of("transport", "off", "biomass", "error"));
        assertThat(p.apply(finding("balance.elements", Severity.ERROR), ReactionClass.TRANSPORT)).isEmpty();
        assertThat(p.apply(finding("balance.elements", Severity.ERROR), ReactionClass.INTERNAL))
                .hasValueSatisfying(f -> assertThat(f.severity()).isEqualTo(Severity.WARNING));
        assertThat(p.apply(finding("balance.elements", Severity.INFO), ReactionClass.BIOMASS))
                .hasValueSatisfying(f -> assertThat(f.severity()).isEqualTo(Severity.ERROR));
        assertThat(p.apply(finding("model.reaction-shape", Severity.WARNING), ReactionClass.TRANSPORT))
                .hasValueSatisfying(f -> assertThat(f.severity()).isEqualTo(Severity.ERROR));
        assertThat(p.classOverrides()).containsOnlyKeys(ReactionClass.TRANSPORT, ReactionClass.BIOMASS);
    }

    @Test
    void unknownRuleIdIsRejectedWithTheListOfKnownOnes() {
        String known = String.join(", ", StandardChecks.all().stream().map(c -> c.ruleId()).sorted().toList());
        assertThat(known).startsWith("balance.charge, ").contains("model.duplicate-id");
        assertThatThrownBy(() -> policy(Map.of("balance.chrage", "warning"), Map.of()))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("unknown rule id 'balance.chrage' in severities; did you mean 'balance.charge'? Known rule ids: "
                        + known);
    }

    @Test
    void extraKnownRuleIdsCanBeConfigured() {
        SeverityPolicy p = SeverityPolicy.of(Map.of("model.baseline-stale", "error"), Map.of(), Set.of("model.baseline-stale"));
        assertThat(p.apply(finding("model.baseline-stale", Severity.WARNING), null))
                .hasValueSatisfying(f -> assertThat(f.severity()).isEqualTo(Severity.ERROR));
    }

    @Test
    void badValuesAndClassesAreRejectedWithTheAllowedOnes() {
        assertThatThrownBy(() -> policy(Map.of("balance.charge", "fatal"), Map.of()))
                .hasMessage("bad severity of rule balance.charge: 'fatal' is not a level. Allowed: error, warning, info, off");
        assertThatThrownBy(() -> policy(Map.of(), Map.of("growth", "off")))
                .hasMessage("unknown reaction class 'growth'. Known classes: internal, transport, atp-maintenance, exchange,"
                        + " demand, sink, biomass, pseudo");
    }

    // Issue #13: severities from the command line, in one line.
    @Test
    void oneLineSettingSetsRulesAreasAndClasses() {
        Set<String> known = Set.of("balance.charge", "balance.elements", "mapping.ambiguous", "mapping.stale",
                "structure.protonation");
        SeverityPolicy.Overrides o = SeverityPolicy.parse(" structure.protonation=off; mapping.*=info,"
                + " mapping.stale=error\n@Biomass = OFF ", "atomledger.severity", known);
        assertThat(o.byRule()).containsExactly(Map.entry("mapping.ambiguous", "info"), Map.entry("mapping.stale", "error"),
                Map.entry("structure.protonation", "off"));
        assertThat(o.byClass()).containsExactly(Map.entry("biomass", "off"));
        assertThat(SeverityPolicy.parse("  ", "x", known).byRule()).isEmpty();
    }

    @Test
    void oneLineSettingWinsOverThePomForTheSameKey() {
        SeverityPolicy.Overrides o = SeverityPolicy.parse("balance.charge=info", "atomledger.severity",
                Set.of("balance.charge", "balance.elements")).over(Map.of("balance.charge", "warning",
                "balance.elements", "warning"), Map.of("sink", "off"));
        assertThat(o.byRule()).containsExactly(Map.entry("balance.charge", "info"), Map.entry("balance.elements", "warning"));
        assertThat(o.byClass()).containsExactly(Map.entry("sink", "off"));
    }

    @Test
    void oneLineSettingNamesTheNearestKnownRuleAreaClassAndLevel() {
        Set<String> known = Set.of("structure.protonation", "mapping.ambiguous");
        assertThatThrownBy(() -> SeverityPolicy.parse("structure.protonaton=off", "atomledger.severity", known))
                .hasMessage("atomledger.severity: unknown rule id 'structure.protonaton'; did you mean"
                        + " 'structure.protonation'? Known rule ids: mapping.ambiguous, structure.protonation");
        assertThatThrownBy(() -> SeverityPolicy.parse("maping.*=off", "atomledger.severity", known))
                .hasMessage("atomledger.severity: no rule belongs to the area 'maping'; did you mean 'mapping'?"
                        + " Areas: mapping, structure");
        assertThatThrownBy(() -> SeverityPolicy.parse("@biomas=off", "atomledger.severity", known))
                .hasMessageStartingWith("atomledger.severity: unknown reaction class 'biomas'; did you mean 'biomass'?");
        assertThatThrownBy(() -> SeverityPolicy.parse("mapping.ambiguous=wraning", "atomledger.severity", known))
                .hasMessage("atomledger.severity: the level of 'mapping.ambiguous': 'wraning' is not a level; did you"
                        + " mean 'warning'? Allowed: error, warning, info, off");
        assertThatThrownBy(() -> SeverityPolicy.parse("mapping.ambiguous", "atomledger.severity", known))
                .hasMessageStartingWith("atomledger.severity: 'mapping.ambiguous' is not of the form key=level");
    }
}
