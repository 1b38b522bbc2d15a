import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def model = report.models[0]
def all = model.findings + model.reactions.collectMany { it.findings }
def pairs = all.collect { [it.ruleId, it.elementId, it.severity] }.sort { a, b -> (a[0] + a[1]) <=> (b[0] + b[1]) }
assert pairs == [['balance.class-mismatch', 'ATPASE_X', 'warning'], ['balance.exempt', 'ATPASE_X', 'info'],
                 ['balance.exempt', 'EX_glc_e', 'info']]
def m = all.find { it.ruleId == 'balance.class-mismatch' }
assert m.data == ['sboClass': 'exchange', 'sboTerm': 'SBO:0000627', 'structureClass': 'internal']
assert model.reactions.find { it.id == 'GLCt' }['class'] == 'transport'
assert report.summary.failed == false
return true
