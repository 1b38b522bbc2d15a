// R_HEX lacks its product proton: exactly that reaction is reported, with H -1 and charge -1,
// and the hint names the model's own proton species.
import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def model = report.models[0]
def hex = model.reactions.find { it.id == 'R_HEX' }
assert hex.balance.elements == [H: '-1']
assert hex.balance.charge == '-1'
def bad = model.reactions.collectMany { it.findings }.findAll { it.severity == 'error' }
assert bad.collect { [it.ruleId, it.elementId] } == [['balance.charge', 'R_HEX'], ['balance.elements', 'R_HEX']]
def elements = bad.find { it.ruleId == 'balance.elements' }
assert elements.data == ['class': 'internal', 'delta.H': '-1', 'delta.charge': '-1',
                         'fix.protonSide': 'products', 'fix.protonSpecies': 'h_c', 'fix.protons': '1']
assert elements.line > 0
assert report.summary.failed == true
def log = new File(basedir, 'build.log').text
assert log.contains('AtomLedger: 2 findings at or above \'error\'')
return true
