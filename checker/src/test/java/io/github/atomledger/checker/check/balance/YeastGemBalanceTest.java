package io.github.atomledger.checker.check.balance;

import static org.assertj.core.api.Assertions.assertThat;

import io.github.atomledger.atommapper.formula.Rational;
import io.github.atomledger.checker.SharedData;
import io.github.atomledger.checker.model.LoadOptions;
import io.github.atomledger.checker.model.ModelLoader;
import io.github.atomledger.checker.model.ModelView;

import java.io.BufferedInputStream;
import java.io.InputStream;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.zip.GZIPInputStream;
import javax.xml.stream.XMLInputFactory;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamReader;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * yeast-GEM 9.0.2 (Lu et al. 2019, Nat Commun 10:3586; Zhang et al. 2024, Mol Syst Biol; CC BY 4.0; provenance
 * in ../shared/data/yeast-GEM.SOURCE.md). Every one of the 4,131 reactions' element vector and charge is
 * compared with an independent computation in this class: a plain JDK StAX pass with BigDecimal arithmetic and
 * its own formula tokenizer, sharing no code with ModelLoader, FormulaParser, Rational or BalanceCalculator.
 */
class YeastGemBalanceTest {

    private static final String FBC = "http://www.sbml.org/sbml/level3/version1/fbc/version2";
    private static final Pattern TOKEN = Pattern.compile("([A-Z][a-z]*)(\\d*)");

    /** The independent result of one reaction: net counts (products minus reactants) and charge; null when unknown. */
    record Independent(Map<String, BigDecimal> elements, BigDecimal charge) {
    }

    private static Map<String, Independent> independent;
    private static ModelView model;
    private static Map<String, ReactionBalance> ours;

    @BeforeAll
    static void compute() throws Exception {
        Path file = SharedData.require("yeast-GEM.xml.gz");
        independent = independent(file);
        model = new ModelLoader(LoadOptions.defaults()).load(file, "yeast-GEM.xml.gz");
        BalanceCalculator calc = new BalanceCalculator();
        ours = calc.balances(model, calc.chemistry(model));
    }

    static Map<String, Independent> independent(Path file) throws Exception {
        XMLInputFactory f = XMLInputFactory.newFactory();
        f.setProperty(XMLInputFactory.SUPPORT_DTD, false);
        f.setProperty(XMLInputFactory.IS_SUPPORTING_EXTERNAL_ENTITIES, false);
        Map<String, Map<String, BigDecimal>> formula = new HashMap<>();
        Map<String, BigDecimal> charge = new HashMap<>();
        Map<String, Independent> out = new LinkedHashMap<>();
        try (InputStream in = new GZIPInputStream(new BufferedInputStream(Files.newInputStream(file)))) {
            XMLStreamReader r = f.createXMLStreamReader(in);
            String reaction = null;
            int sign = 0;
            Map<String, BigDecimal> net = null;
            BigDecimal q = null;
            boolean known = true;
            while (r.hasNext()) {
                int ev = r.next();
                if (ev == XMLStreamConstants.START_ELEMENT) {
                    switch (r.getLocalName()) {
                        case "species" -> {
                            String id = r.getAttributeValue(null, "id");
                            String text = r.getAttributeValue(FBC, "chemicalFormula");
                            String c = r.getAttributeValue(FBC, "charge");
                            if (text != null) {
                                Map<String, BigDecimal> counts = new TreeMap<>();
                                Matcher m = TOKEN.matcher(text);
                                int end = 0;
                                while (m.find() && m.start() == end) {
                                    counts.merge(m.group(1), new BigDecimal(m.group(2).isEmpty() ? "1" : m.group(2)), BigDecimal::add);
                                    end = m.end();
                                }
                                assertThat(end).as("formula of " + id).isEqualTo(text.length());
                                formula.put(id, counts);
                            }
                            if (c != null) {
                                charge.put(id, new BigDecimal(c));
                            }
                        }
                        case "reaction" -> {
                            reaction = r.getAttributeValue(null, "id");
                            net = new TreeMap<>();
                            q = BigDecimal.ZERO;
                            known = true;
                        }
                        case "listOfReactants" -> sign = -1;
                        case "listOfProducts" -> sign = 1;
                        case "speciesReference" -> {
                            String s = r.getAttributeValue(null, "species");
                            BigDecimal v = new BigDecimal(r.getAttributeValue(null, "stoichiometry")).multiply(BigDecimal.valueOf(sign));
                            Map<String, BigDecimal> counts = formula.get(s);
                            if (counts == null) {
                                known = false;
                            } else {
                                for (Map.Entry<String, BigDecimal> e : counts.entrySet()) {
                                    net.merge(e.getKey(), e.getValue().multiply(v), BigDecimal::add);
                                }
                            }
                            BigDecimal c = charge.get(s);
                            q = c == null || q == null ? null : q.add(c.multiply(v));
                        }
                        default -> {
                        }
                    }
                } else if (ev == XMLStreamConstants.END_ELEMENT && r.getLocalName().equals("reaction")) {
                    net.values().removeIf(v -> v.signum() == 0);
                    out.put(reaction, new Independent(known ? net : null, q));
                }
            }
        }
        return out;
    }

    private static Rational exact(BigDecimal d) {
        return d.scale() <= 0 ? Rational.of(d.toBigIntegerExact(), BigInteger.ONE)
                : Rational.of(d.unscaledValue(), BigInteger.TEN.pow(d.scale()));
    }

    @Test
    void everyReactionAgreesWithTheIndependentComputation() {
        assertThat(independent).hasSize(4131);
        assertThat(ours.keySet()).containsExactlyElementsOf(independent.keySet());
        List<String> disagreements = new ArrayList<>();
        independent.forEach((id, ind) -> {
            ReactionBalance b = ours.get(id);
            if (ind.elements() == null) {
                if (b.elementsComputable()) {
                    disagreements.add(id + ": we computed elements without formulas");
                }
            } else {
                Map<String, Rational> expected = new TreeMap<>();
                ind.elements().forEach((k, v) -> expected.put(k, exact(v)));
                if (!b.elementsComputable() || !b.elements().equals(expected)) {
                    disagreements.add(id + ": elements " + b.elements() + " vs " + expected);
                }
            }
            Rational expectedCharge = ind.charge() == null ? null : exact(ind.charge());
            if (!java.util.Objects.equals(b.charge(), expectedCharge)) {
                disagreements.add(id + ": charge " + b.charge() + " vs " + expectedCharge);
            }
        });
        assertThat(disagreements).isEmpty();
    }

    @Test
    void pinsReactionsFromTheProvenanceReference() {
        // The data's provenance note lists these from its own reference script (products minus reactants).
        assertThat(ours.get("r_0774").elements()).containsOnlyKeys("H", "O")
                .containsEntry("H", Rational.ONE).containsEntry("O", Rational.ONE);
        assertThat(ours.get("r_1603").elements()).containsExactlyEntriesOf(new TreeMap<>(Map.of("H", Rational.of(2))));
        assertThat(ours.get("r_2284").elements()).containsExactlyEntriesOf(new TreeMap<>(Map.of("H", Rational.of(-4))));
        assertThat(ours.get("r_4568").elements()).containsExactlyEntriesOf(new TreeMap<>(Map.of("O", Rational.ONE)));
        assertThat(ours.get("r_4679").elements()).containsExactlyEntriesOf(new TreeMap<>(Map.of("H", Rational.of(-1))));
        // Fractional because of fractional proton coefficients (0.633 H+): exact, not 0.6330000000000001.
        assertThat(ours.get("r_0438").charge()).isEqualTo(Rational.parse("-0.633"));
        assertThat(ours.get("r_0439").charge()).isEqualTo(Rational.parse("1.266"));
    }

    @Test
    void readsTheOneMicroCoefficientExactly() {
        // s_0750 in r_4598: the YAML has the quoted string '-1e-06' (provenance note), a reactant coefficient of 1e-06.
        String text = model.reactions().stream().filter(r -> r.id().equals("r_4598")).findFirst().orElseThrow()
                .participants().stream().filter(p -> p.species().equals("s_0750")).findFirst().orElseThrow().stoichiometryText();
        assertThat(Rational.parse(text)).isEqualTo(Rational.of(1, 1_000_000));
    }

    @Test
    void classifiesTheLumpingPseudoReactionsAsBiomass() {
        long lumping = ours.values().stream().filter(b -> b.reactionClass() == ReactionClass.BIOMASS).count();
        long oneSided = model.reactions().stream().filter(r -> r.isOneSided()).count();
        assertThat(oneSided).as("provenance: 274 reactions with one side empty").isEqualTo(274);
        assertThat(ours.values().stream().filter(b -> !b.reactionClass().balanceComputed()).count()).isEqualTo(274);
        assertThat(lumping).isGreaterThanOrEqualTo(182);
    }
}
