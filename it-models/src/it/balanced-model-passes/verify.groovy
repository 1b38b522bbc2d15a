// A balanced model passes: no error or warning, only the exchange reaction's info finding,
// and the run leaves no stray log file behind.
import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
assert report.schemaVersion == '2.0'
assert report.models.size() == 1
def model = report.models[0]
assert model.file == 'models/upper_glycolysis.xml'
assert model.reactions*.id == ['R_HEX', 'R_PGI', 'R_ATPM', 'R_EX_glc']
def findings = model.reactions.collectMany { it.findings } + model.findings
assert findings.collect { [it.ruleId, it.elementId, it.severity] } == [['balance.exempt', 'R_EX_glc', 'info']]
assert model.reactions.find { it.id == 'R_EX_glc' }.class == 'sink'
model.reactions.findAll { it.class == 'internal' }.each {
    assert it.balance.elements == [:] : it.id
    assert it.balance.charge == '0' : it.id
}
assert model.reactions.find { it.id == 'R_ATPM' }.class == 'internal'
assert !new File(basedir, 'jsbml.log').exists()
// JSBML's own log4j set-up would print to stdout and StatusLogger complaints; neither may appear.
assert !new File(basedir, 'build.log').readLines().any { it.contains('StatusLogger') || it =~ /^\s*(WARN|ERROR|INFO) \(/ }
return true
