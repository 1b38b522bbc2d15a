// A map written for an older structure is reported as stale, as a warning.
import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def findings = report.models[0].reactions.collectMany { it.findings }.findAll { it.severity != 'info' }
assert findings.collect { [it.ruleId, it.elementId, it.severity] } == [['mapping.stale', 'R_FBA', 'warning']]
assert findings[0].data == [origin: 'inferred', reason: 'structure-changed', species: 'fdp']
return true
