// Against the previous release (previous/models/central.xml), with failOn=regressions: only the
// two regressions fail; the old imbalance of R_G6PH does not, though it is an error.
import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def model = report.models[0]
def findings = model.reactions.collectMany { it.findings } + model.findings
def diffRules = ['model.reaction-added', 'model.reaction-removed', 'balance.regression', 'balance.imbalance-changed',
                 'balance.fixed', 'mapping.transitions-changed']
assert findings.findAll { it.ruleId in diffRules }.collect { [it.ruleId, it.elementId, it.severity] }.toSorted { it.toString() } == [
        ['balance.fixed', 'R_PFK', 'info'],
        ['balance.imbalance-changed', 'R_G6PH', 'warning'],
        ['balance.regression', 'R_ATPASE2', 'error'],
        ['balance.regression', 'R_HEX', 'error'],
        ['mapping.transitions-changed', 'R_PGI', 'warning'],
        ['model.reaction-added', 'R_ATPASE2', 'info'],
        ['model.reaction-removed', 'R_FBP', 'warning']]
def pgi = findings.find { it.ruleId == 'mapping.transitions-changed' }
assert pgi.data == ['moved': '2', 'moved.g6p_c#1:5': 'f6p_c#1:5 -> f6p_c#1:6', 'moved.g6p_c#1:6': 'f6p_c#1:6 -> f6p_c#1:5', 'now': 'mapped']
assert findings.find { it.ruleId == 'balance.regression' && it.elementId == 'R_HEX' }.data ==
        ['class': 'internal', 'delta.H': '-1', 'delta.charge': '-1', 'now.charge': 'imbalanced', 'now.elements': 'imbalanced',
         'was.charge': 'balanced', 'was.elements': 'balanced']
assert findings.any { it.ruleId == 'balance.elements' && it.elementId == 'R_G6PH' && it.severity == 'error' }
assert report.summary.gate == [failScope: 'regressions']
assert report.summary.failed == true
def log = new File(basedir, 'build.log').text
assert log.contains("AtomLedger: 2 findings at or above 'error'")
return true
