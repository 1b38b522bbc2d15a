// Both R_HEX findings are listed in the committed baseline with a reason: they stay in the report,
// marked accepted, and the build passes.
import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
assert report.schemaVersion == '2.0'
def model = report.models[0]
def findings = model.reactions.collectMany { it.findings } + model.findings
assert findings.collect { [it.ruleId, it.elementId, it.severity, it.baseline] }.toSorted { it.toString() } == [
        ['balance.charge', 'R_HEX', 'error', 'accepted'],
        ['balance.elements', 'R_HEX', 'error', 'accepted'],
        ['balance.exempt', 'R_EX_glc', 'info', 'new']]
assert report.summary.failed == false
assert report.summary.gate == [failScope: 'findings', baseline: [file: 'models/atomledger-baseline.tsv',
                                                               accepted: 2, 'pending-reason': 0, new: 1, stale: 0]]
return true
