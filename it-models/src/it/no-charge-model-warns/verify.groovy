// A model without any charge passes (its elements balance), but says so: the counts show that no
// reaction's charge was checked and why, and one warning (not 11 info rows) names the gap (issue #13).
import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def model = report.models[0]
assert model.summary.balance.checked == 5
assert model.summary.balance.notChecked == 1
assert model.summary.balance.elements == [balanced: 5, imbalanced: 0, notComputable: 0, because: [:]]
assert model.summary.balance.charge == [balanced: 0, imbalanced: 0, notComputable: 5, because: [missingCharge: 5]]
assert model.summary.balance.speciesWithoutCharge == 10
assert model.summary.chargeImbalanced == 0
def all = model.findings + model.reactions.collectMany { it.findings }
assert all.findAll { it.severity != 'info' }.collect { [it.ruleId, it.elementId, it.severity] } ==
        [['model.charges-absent', 'glycolysis_no_charges', 'warning']]
assert all.find { it.ruleId == 'model.charges-absent' }.data == [checkedReactions: '5', species: '10']
assert !all.any { it.ruleId == 'model.charge-missing' }
assert report.summary.failed == false
def log = new File(basedir, 'build.log').text
assert log.contains('[WARNING]   model.charges-absent (1)')
return true
