// R_HEX is balanced now: its two baseline entries match nothing and are reported as stale
// (warnings, so the build passes), naming the baseline line to delete.
import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def model = report.models[0]
def findings = model.reactions.collectMany { it.findings } + model.findings
def stale = findings.findAll { it.ruleId == 'model.baseline-stale' }
assert stale.collect { [it.elementId, it.severity, it.data.ruleId, it.data.baselineLine] }.toSorted { it.toString() } == [
        ['R_HEX', 'warning', 'balance.charge', '3'],
        ['R_HEX', 'warning', 'balance.elements', '4']]
assert stale.every { it.modelFile == 'models/upper_glycolysis.xml' && it.data.baselineFile == 'models/atomledger-baseline.tsv' }
assert findings.findAll { it.ruleId != 'model.baseline-stale' }.collect { [it.ruleId, it.elementId] } == [['balance.exempt', 'R_EX_glc']]
assert report.summary.failed == false
assert report.summary.gate.baseline.stale == 2
return true
