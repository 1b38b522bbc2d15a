import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def model = report.models[0]
def all = model.findings + model.reactions.collectMany { it.findings }
def pairs = all.collect { [it.ruleId, it.elementId, it.severity] }.sort { a, b -> (a[0] + a[1]) <=> (b[0] + b[1]) }
assert pairs == [['balance.elements', 'ACYLT_BAD', 'error'], ['balance.polymer', 'GLYC', 'warning']]
def bad = all.find { it.ruleId == 'balance.elements' }
assert bad.data.findAll { it.key.startsWith('delta.') } == ['delta.C': '-1', 'delta.H': '1', 'delta.O': '-1', 'delta.R': '-1', 'delta.charge': '0']
assert model.reactions.find { it.id == 'GLYC' }.balance.computable == false
assert report.summary.failed == true
return true
