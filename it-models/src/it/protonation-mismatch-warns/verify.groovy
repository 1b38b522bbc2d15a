import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def model = report.models[0]
// Structures for only some species: the atom-map rules report the others (mapping.*); this case is
// about the formula-versus-structure rules, so those are left out here.
def all = (model.findings + model.reactions.collectMany { it.findings }).findAll { !it.ruleId.startsWith('mapping.') }
def pairs = all.collect { [it.ruleId, it.elementId, it.severity] }.sort { a, b -> (a[0] + a[1]) <=> (b[0] + b[1]) }
// Exactly one finding: the protonation-only mismatch of pyruvate (SMILES of pyruvic acid, one H and one charge more),
// one summary finding per model (issue #13) listing the species in its data.
assert pairs == [['structure.protonation', 'ledgerella_lower', 'warning']]
def f = all[0]
assert f.data == [count: '1', protons: '+1', species: 'pyr_c']
assert f.line == 0
assert report.summary.failed == false
return true
