// The goal runs in a folder without pom.xml; reports land in ./target/atomledger.
import groovy.json.JsonSlurper

assert !new File(basedir, 'pom.xml').exists()
def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def findings = report.models[0].reactions.collectMany { it.findings }
assert findings.findAll { it.severity == 'error' }.collect { [it.ruleId, it.elementId] } ==
        [['balance.charge', 'R_HEX'], ['balance.elements', 'R_HEX']]
assert !new File(basedir, 'jsbml.log').exists()
return true
