// A curated RXN map that disagrees with the structures' minimum bond-edit map fails the build, naming the
// carbons that go elsewhere and the file. The file's atoms are drawn in its own order; the report names
// our atoms (SMILES positions in structures.tsv: 2pg C3 = atom 2, C1 = atom 9; pep C3 = 1, C1 = 8).
import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def eno = report.models[0].reactions.find { it.id == 'R_ENO' }
def errors = (report.models[0].findings + report.models[0].reactions.collectMany { it.findings })
        .findAll { it.severity == 'error' }
assert errors.collect { [it.ruleId, it.elementId] } == [['mapping.curated-differs', 'R_ENO']]
assert errors[0].data.differing == 'M_2pg_c#1:2->M_pep_c#1:8,M_2pg_c#1:9->M_pep_c#1:1'
assert errors[0].data.file == 'maps-curated/R_ENO.rxn'
assert (errors[0].data.extraCost as int) > 0
assert eno.mapping.status == 'mapped'
assert new File(basedir, 'build.log').text.contains('mapping.curated-differs (1): R_ENO')
return true
