// Problems with rows of the structure table are reported at the table's file and line, the unknown species
// with its real line and a message that says it once, and a species with a broken row is not also reported
// as having no structure (issue #13).
import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def model = report.models[0]
def all = model.findings + model.reactions.collectMany { it.findings }
def table = all.findAll { it.ruleId in ['structure.invalid', 'structure.unknown-species'] }
        .collect { [it.ruleId, it.elementId, it.modelFile, it.line] }.sort { it[3] }
assert table == [['structure.invalid', 'glc_c', 'structures.tsv', 4], ['structure.unknown-species', 'ghost_c', 'structures.tsv', 6]]
assert all.find { it.ruleId == 'structure.unknown-species' }.message ==
        'The structure table names species ghost_c, which models/table_rows.xml does not define.'
def missing = all.findAll { it.ruleId == 'mapping.structure-missing' }
assert missing.size() == 1 && missing[0].data.species.split(',').toList().sort() == ['adp_c', 'atp_c', 'h_c']
def hex = model.reactions.find { it.id == 'R_HEX' }
assert hex.mapping.status == 'no-structure'
assert hex.mapping.missingStructures == ['adp_c', 'atp_c', 'h_c']
assert report.summary.failed == true
return true
