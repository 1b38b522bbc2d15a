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
                .hasMessage("unknown rule id 'balance.chrage' in severities; known rule ids: " + known);
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
                .hasMessage("bad severity of rule balance.charge: 'fatal'; allowed: info, warning, error, off");
        assertThatThrownBy(() -> policy(Map.of(), Map.of("growth", "off")))
                .hasMessage("unknown reaction class 'growth'; allowed: internal, transport, atp-maintenance, exchange,"
                        + " demand, sink, biomass, pseudo");
    }
}
