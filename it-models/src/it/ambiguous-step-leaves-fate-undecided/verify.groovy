// An ambiguous step leaves the carbons its co-optimal maps disagree on undecided, and a declared fate
// of such a carbon is its own finding (trace.fate-undecided), never a guess.
import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def model = report.models[0]
def mcm = model.reactions.find { it.id == 'R_MCM' }
assert mcm.mapping.status == 'ambiguous'
def all = model.findings + model.reactions.collectMany { it.findings }
def notable = all.findAll { it.severity != 'info' }.collect { it.ruleId + ' ' + it.elementId }.sort()
// mapping.review (issue 16): the reported map moves a carbon group to its neighbour (a 1,2-shift).
assert notable == ['mapping.ambiguous R_MCM', 'mapping.review R_MCM', 'trace.fate-undecided mmcoa_c']
def undecided = all.find { it.ruleId == 'trace.fate-undecided' }
assert undecided.severity == 'warning'
assert undecided.data.carbon == 'C3' && undecided.data.step == 'R_MCM' && undecided.data.stepIndex == '1'

def traces = new JsonSlurper().parse(new File(basedir, 'target/atomledger/traces.json')).traces
assert traces.size() == 1 && traces[0].pathway == 'mutase' && traces[0].source == 'mmcoa_c'
def status = traces[0].carbons.collectEntries { [it.label, it.status] }
assert status == [C1: 'decided', C2: 'undecided', C3: 'undecided', C4: 'decided']
def c3 = traces[0].carbons.find { it.label == 'C3' }
assert c3.fate == null && c3.undecided.stepIndex == 1 && c3.undecided.reason.contains('co-optimal')
assert traces[0].carbons.find { it.label == 'C1' }.fate.species == 'succoa_c'
assert traces[0].expectations.collect { it.verdict } == ['holds', 'undecided']
return true
