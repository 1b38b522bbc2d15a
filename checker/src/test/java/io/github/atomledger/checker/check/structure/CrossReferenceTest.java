package io.github.atomledger.checker.check.structure;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Optional;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Issue 15: cross-references as real models write them. Forms and id patterns from the
 * identifiers.org registry (METHODS.md §3); the {@code inchi_key} spelling is the BiGG export
 * pitfall (github.com/SBRG/bigg_models issue 363); ids from memory (pyruvate CHEBI:15361, KEGG
 * C00022, MetaNetX MNXM23, InChIKey LCTONWCANYUPML-UHFFFAOYSA-M).
 */
class CrossReferenceTest {

    @ParameterizedTest
    @CsvSource(delimiter = '|', textBlock = """
        https://identifiers.org/chebi/CHEBI:15361            | chebi:CHEBI:15361
        http://identifiers.org/chebi/CHEBI:15361             | chebi:CHEBI:15361
        https://identifiers.org/CHEBI:15361                  | chebi:CHEBI:15361
        http://identifiers.org/chebi/15361                   | chebi:CHEBI:15361
        urn:miriam:chebi:CHEBI%3A15361                       | chebi:CHEBI:15361
        http://purl.obolibrary.org/obo/CHEBI_15361           | chebi:CHEBI:15361
        https://identifiers.org/kegg.compound/C00022         | kegg.compound:C00022
        https://identifiers.org/kegg.compound:C00022         | kegg.compound:C00022
        https://identifiers.org/metanetx.chemical/MNXM23     | metanetx.chemical:MNXM23
        urn:miriam:metanetx.chemical:MNXM23                  | metanetx.chemical:MNXM23
        http://identifiers.org/bigg.metabolite/pyr           | bigg.metabolite:pyr
        https://identifiers.org/inchikey/LCTONWCANYUPML-UHFFFAOYSA-M  | inchikey:LCTONWCANYUPML-UHFFFAOYSA-M
        http://identifiers.org/inchi_key/LCTONWCANYUPML-UHFFFAOYSA-M  | inchikey:LCTONWCANYUPML-UHFFFAOYSA-M
        """)
    void readsTheUriFormsRealModelsUse(String uri, String expected) {
        assertThat(CrossReference.fromUri(uri)).map(CrossReference::toString).contains(expected);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', textBlock = """
        https://identifiers.org/hmdb/HMDB00243
        https://identifiers.org/chebi/pyruvate
        https://identifiers.org/kegg.compound/R00200
        https://example.org/CHEBI:15361
        https://identifiers.org/bigg.metabolite/pyr-c
        """)
    void ignoresOtherCollectionsAndIdsOfTheWrongForm(String uri) {
        assertThat(CrossReference.fromUri(uri)).isEmpty();
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', textBlock = """
        CHEBI_15361                   | chebi:CHEBI:15361
        CHEBI:15361                   | chebi:CHEBI:15361
        chebi_15361                   | chebi:CHEBI:15361
        C00022                        | kegg.compound:C00022
        MNXM23                        | metanetx.chemical:MNXM23
        bigg.metabolite_pyr           | bigg.metabolite:pyr
        kegg.compound_C00022          | kegg.compound:C00022
        LCTONWCANYUPML-UHFFFAOYSA-M   | inchikey:LCTONWCANYUPML-UHFFFAOYSA-M
        """)
    void readsFileAndFieldNames(String name, String expected) {
        assertThat(CrossReference.fromName(name)).map(CrossReference::toString).contains(expected);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', textBlock = """
        pyr
        M_pyr_c
        s_0001
        """)
    void aBareWordIsNoCrossReference(String name) {
        assertThat(CrossReference.fromName(name)).isEqualTo(Optional.empty());
    }
}
