package io.github.atomledger.checker.annotate;

import io.github.atomledger.checker.transitions.StoredStructure;
import io.github.atomledger.checker.transitions.TransitionAnnotation;
import io.github.atomledger.checker.transitions.AnnotationIndex;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.github.atomledger.atommapper.mapping.AtomRef;
import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.checker.AtomLedgerException;
import io.github.atomledger.checker.SharedData;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Element;
import org.w3c.dom.Node;
import org.xmlunit.builder.DiffBuilder;
import org.xmlunit.builder.Input;
import org.xmlunit.diff.Diff;

class ModelAnnotatorTest {

    @TempDir
    Path dir;

    private static TransitionAnnotation sample(String from, String to) {
        return new TransitionAnnotation(TransitionAnnotation.INFERRED, "mapped", 2, "1",
                List.of(new AtomTransition(new AtomRef(from, 1, 1), new AtomRef(to, 1, 2), "C")),
                "[CH3:1]>>[CH3:1]", List.of(new StoredStructure(from, "sha256:00", "C")));
    }

    private static final String SMALL = """
            <?xml version='1.0' encoding='UTF-8'?>
            <sbml xmlns="http://www.sbml.org/sbml/level3/version1/core" level="3" version="1">
              <model id="m">
                <listOfReactions>
                  <reaction id="R1" reversible="false">
                    <notes><body xmlns="http://www.w3.org/1999/xhtml"><p>kept</p></body></notes>
                    <listOfReactants>
                      <speciesReference species="a" stoichiometry="1" constant="true"/>
                    </listOfReactants>
                  </reaction>
                  <reaction id="R2" reversible="false">
                    <annotation>
                      <other:x xmlns:other="urn:other">foreign</other:x>
                    </annotation>
                  </reaction>
                </listOfReactions>
              </model>
            </sbml>
            """;

    @Test
    void addsAnnotationAfterNotesAndInsideExistingAnnotationAndKeepsTheRestByteForByte() throws Exception {
        Path file = dir.resolve("m.xml");
        Files.writeString(file, SMALL);
        Map<String, TransitionAnnotation> a = new LinkedHashMap<>();
        a.put("R1", sample("a", "b"));
        a.put("R2", sample("c", "d"));
        ModelAnnotator.Outcome out = new ModelAnnotator(false, false, 1 << 20).annotate(file, "m.xml", a);
        assertThat(out.changes()).extracting(ModelAnnotator.Change::action)
                .containsExactly(ModelAnnotator.Action.ADDED, ModelAnnotator.Action.ADDED);
        String text = Files.readString(file);
        assertThat(text).startsWith("<?xml version='1.0' encoding='UTF-8'?>");
        assertThat(text.indexOf("</notes>")).isLessThan(text.indexOf("<annotation>"));
        assertThat(text.indexOf("<annotation>")).isLessThan(text.indexOf("<listOfReactants>"));
        assertThat(text).contains("<other:x xmlns:other=\"urn:other\">foreign</other:x>");
        String removed = text.replaceAll("(?s)\\n\\s*<annotation>\\s*<atl:atomTransitions.*?</atl:atomTransitions>\\s*</annotation>", "")
                .replaceAll("(?s)\\s*<atl:atomTransitions.*?</atl:atomTransitions>", "");
        assertThat(removed).isEqualTo(SMALL);
        AnnotationIndex index = AnnotationIndex.scan(text, "m.xml");
        assertThat(index.stored("R1")).contains(sample("a", "b"));
    }

    @Test
    void annotatingTwiceChangesNothingTheSecondTime() throws Exception {
        Path file = dir.resolve("m.xml");
        Files.writeString(file, SMALL);
        Map<String, TransitionAnnotation> a = Map.of("R1", sample("a", "b"), "R2", sample("c", "d"));
        new ModelAnnotator(false, false, 1 << 20).annotate(file, "m.xml", a);
        byte[] once = Files.readAllBytes(file);
        ModelAnnotator.Outcome second = new ModelAnnotator(false, false, 1 << 20).annotate(file, "m.xml", a);
        assertThat(second.wouldChange()).isFalse();
        assertThat(second.changes()).extracting(ModelAnnotator.Change::action).containsOnly(ModelAnnotator.Action.UNCHANGED);
        assertThat(Files.readAllBytes(file)).isEqualTo(once);
    }

    @Test
    void keepsCuratedAnnotationsUnlessAskedAndDryRunWritesNothing() throws Exception {
        Path file = dir.resolve("m.xml");
        TransitionAnnotation curated = new TransitionAnnotation(TransitionAnnotation.CURATED, "", -1, "",
                sample("a", "b").carbons(), "", List.of());
        Files.writeString(file, SMALL);
        new ModelAnnotator(false, false, 1 << 20).annotate(file, "m.xml", Map.of("R1", curated));
        byte[] before = Files.readAllBytes(file);
        ModelAnnotator.Outcome kept = new ModelAnnotator(false, false, 1 << 20).annotate(file, "m.xml", Map.of("R1", sample("x", "y")));
        assertThat(kept.changes().get(0).action()).isEqualTo(ModelAnnotator.Action.KEPT_CURATED);
        ModelAnnotator.Outcome dry = new ModelAnnotator(true, true, 1 << 20).annotate(file, "m.xml", Map.of("R1", sample("x", "y")));
        assertThat(dry.wouldChange()).isTrue();
        assertThat(dry.written()).isFalse();
        assertThat(Files.readAllBytes(file)).isEqualTo(before);
    }

    @Test
    void keepsFilePermissionsAndRefusesMissingFiles() throws Exception {
        Path file = dir.resolve("m.xml");
        Files.writeString(file, SMALL);
        Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-r-----"));
        new ModelAnnotator(false, false, 1 << 20).annotate(file, "m.xml", Map.of("R1", sample("a", "b")));
        assertThat(PosixFilePermissions.toString(Files.getPosixFilePermissions(file))).isEqualTo("rw-r-----");
        assertThatThrownBy(() -> new ModelAnnotator(false, false, 1 << 20)
                .annotate(dir.resolve("none.xml"), "none.xml", Map.of()))
                .isInstanceOf(AtomLedgerException.class).hasMessageContaining("none.xml: model file not found");
    }

    /** Round trip on the real BiGG e_coli_core export: nothing but our elements differs (XMLUnit). */
    @Test
    void roundTripOnEcoliCoreChangesOnlyOurAnnotations() throws Exception {
        Path source = SharedData.require("e_coli_core.original.xml");
        Path file = dir.resolve("e_coli_core.xml");
        Files.copy(source, file);
        AnnotationIndex index = AnnotationIndex.scan(Files.readString(file, StandardCharsets.UTF_8), "e");
        Map<String, TransitionAnnotation> all = new LinkedHashMap<>();
        index.reactions().keySet().forEach(id -> all.put(id, sample("M_a", "M_b")));
        assertThat(all).hasSize(95);
        new ModelAnnotator(false, false, 1 << 30).annotate(file, "e_coli_core.xml", all);
        Diff diff = DiffBuilder.compare(Input.fromFile(source.toFile())).withTest(Input.fromFile(file.toFile()))
                .withNodeFilter(ModelAnnotatorTest::notOurs).ignoreWhitespace().checkForSimilar().build();
        assertThat(diff.hasDifferences()).as(diff.toString()).isFalse();
        assertThat(AnnotationIndex.scan(Files.readString(file), "e").reactions().values())
                .allMatch(s -> s.stored() != null);
        byte[] once = Files.readAllBytes(file);
        new ModelAnnotator(false, false, 1 << 30).annotate(file, "e_coli_core.xml", all);
        assertThat(Files.readAllBytes(file)).isEqualTo(once);
    }

    static boolean notOurs(Node n) {
        if (n instanceof Element e) {
            if (TransitionAnnotation.NAMESPACE.equals(e.getNamespaceURI())) {
                return false;
            }
            if (e.getLocalName().equals("annotation")) {
                for (Node c = e.getFirstChild(); c != null; c = c.getNextSibling()) {
                    if (c instanceof Element ce && !TransitionAnnotation.NAMESPACE.equals(ce.getNamespaceURI())) {
                        return true;
                    }
                }
                return false;
            }
        }
        return true;
    }
}
