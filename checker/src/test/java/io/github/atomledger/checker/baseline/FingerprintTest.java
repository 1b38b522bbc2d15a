package io.github.atomledger.checker.baseline;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.checker.check.Finding;
import io.github.atomledger.checker.check.Severity;

import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

class FingerprintTest {

    static Finding finding(String rule, String element, int line, String message, Map<String, String> data) {
        return new Finding(rule, Severity.ERROR, "models/x.xml", element, line, message, new TreeMap<>(data));
    }

    @Test
    void isTheSha256PrefixOfTheSortedKeyValueLines() {
        // Reference value from GNU coreutils:
        // printf 'class=internal\ndelta.H=-1\ndelta.charge=-1\n' | sha256sum  ->  e7884a5e450f6cf8...
        assertThat(Fingerprint.of(Map.of("delta.charge", "-1", "class", "internal", "delta.H", "-1")))
                .isEqualTo("e7884a5e450f6cf8");
        // SHA-256 of the empty message, the well-known value (from memory, and coreutils agrees).
        assertThat(Fingerprint.of(Map.of())).isEqualTo("e3b0c44298fc1c14");
    }

    @Test
    void ignoresMessageLineRuleAndElement() {
        Map<String, String> data = Map.of("class", "internal", "delta.H", "-1");
        assertThat(Fingerprint.of(finding("balance.elements", "R_A", 12, "one wording", data)))
                .isEqualTo(Fingerprint.of(finding("balance.charge", "R_B", 900, "another wording", data)));
    }

    @Test
    void changesWhenTheFactsChange() {
        assertThat(Fingerprint.of(Map.of("delta.H", "-1"))).isNotEqualTo(Fingerprint.of(Map.of("delta.H", "-2")));
        assertThat(Fingerprint.of(Map.of("a", "b=c"))).isNotEqualTo(Fingerprint.of(Map.of("a=b", "c")));
    }

    @Test
    void validatesItsTextForm() {
        assertThat(Fingerprint.isValid("e7884a5e450f6cf8")).isTrue();
        assertThat(Fingerprint.isValid("E7884A5E450F6CF8")).isFalse();
        assertThat(Fingerprint.isValid("e7884a5e")).isFalse();
    }
}
