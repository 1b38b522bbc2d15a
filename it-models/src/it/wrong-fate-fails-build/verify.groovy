// A fates file with one wrong expectation fails the build, naming the carbon, the expected and actual
// fate and the step where they part.
import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def model = report.models[0]
def all = model.findings + model.reactions.collectMany { it.findings }
def errors = all.findAll { it.severity == 'error' }
assert errors.collect { [it.ruleId, it.elementId] } == [['trace.fate-differs', 'thr_c']]
def d = errors[0].data
assert d.pathway == 'threonine' && d.carbon == 'C3' && d.expected == 'gly_c' && d.actual == 'accoa_c:C1'
assert d.step == 'R_KBL' && d.stepIndex == '2' && d.expectation == 'models/fates.tsv:4'
assert errors[0].message.contains('they part at step 2, R_KBL')
assert all.findAll { it.severity == 'warning' }.isEmpty()
assert new File(basedir, 'build.log').text.contains('trace.fate-differs (1): thr_c')
return true
