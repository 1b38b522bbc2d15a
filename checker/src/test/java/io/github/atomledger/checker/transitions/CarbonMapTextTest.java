package io.github.atomledger.checker.transitions;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.mapping.AtomTransition;

import java.util.List;
import org.junit.jupiter.api.Test;

class CarbonMapTextTest {

    private static AtomTransition t(String a, int ca, int ia, String b, int cb, int ib) {
        return new AtomTransition(new AtomRef(a, ca, ia), new AtomRef(b, cb, ib), "C");
    }

    @Test
    void formatsOneLinePerMoleculePairAndParsesItBack() {
        List<AtomTransition> map = List.of(t("oaa_c", 1, 1, "cit_c", 1, 6), t("accoa_c", 1, 2, "cit_c", 1, 4),
                t("accoa_c", 1, 1, "cit_c", 1, 5), t("atp_c", 2, 3, "adp_c", 1, 3));
        List<String> lines = CarbonMapText.format(map);
        assertThat(lines).containsExactly("accoa_c: 1 2 = cit_c: 5 4", "atp_c#2: 3 = adp_c: 3", "oaa_c: 1 = cit_c: 6");
        assertThat(CarbonMapText.parse(String.join("\n", lines))).isEqualTo(map.stream().sorted().toList());
    }

    @Test
    void rejectsLinesWithUnequalAtomCountsNamingTheLine() {
        assertThatThrownBy(() -> CarbonMapText.parse("a: 1 2 = b: 1 2\n a: 3 = b: 3 4"))
                .hasMessageContaining("line 2").hasMessageContaining("1 source atom but 2 target atoms");
        assertThatThrownBy(() -> CarbonMapText.parse("a 1 = b: 1")).hasMessageContaining("missing ':'");
        assertThatThrownBy(() -> CarbonMapText.parse("a#0: 1 = b: 1")).hasMessageContaining("bad species, copy or atom");
    }
}
