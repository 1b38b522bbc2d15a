// The baseline accepts R_HEX's findings; R_ATPM's are new and fail the build.
import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def model = report.models[0]
def errors = (model.reactions.collectMany { it.findings } + model.findings).findAll { it.severity == 'error' }
assert errors.collect { [it.ruleId, it.elementId, it.baseline] }.toSorted { it.toString() } == [
        ['balance.charge', 'R_ATPM', 'new'],
        ['balance.charge', 'R_HEX', 'accepted'],
        ['balance.elements', 'R_ATPM', 'new'],
        ['balance.elements', 'R_HEX', 'accepted']]
assert report.summary.failed == true
assert report.summary.gate.baseline.accepted == 2
def log = new File(basedir, 'build.log').text
assert log.contains("AtomLedger: 2 findings at or above 'error' (4 errors, 0 warnings, 1 info): balance.charge (1): R_ATPM; balance.elements (1): R_ATPM")
return true
