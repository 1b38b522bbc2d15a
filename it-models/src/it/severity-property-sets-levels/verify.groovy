// -Datomledger.severity sets levels from the command line (issue #13): the planted model's four element
// imbalances become warnings, the common-cause finding is switched off, and the build passes.
import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def model = report.models[0]
def all = model.findings + model.reactions.collectMany { it.findings }
assert all.findAll { it.ruleId == 'balance.elements' }.collect { [it.elementId, it.severity] }.sort() ==
        [['R_ADK', 'warning'], ['R_HEX', 'warning'], ['R_PFK', 'warning'], ['R_PYK', 'warning']]
assert !all.any { it.ruleId == 'balance.common-cause' }
assert !all.any { it.severity == 'error' }
assert report.summary.failed == false
return true
