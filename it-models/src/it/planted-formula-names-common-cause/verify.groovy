// One wrong formula behind four imbalances: one finding names ATP as the likely common cause, once,
// with the reactions it explains and the formula that balances them all (issue #13).
import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def model = report.models[0]
def all = model.findings + model.reactions.collectMany { it.findings }
assert all.findAll { it.severity == 'error' }.collect { [it.ruleId, it.elementId] }.sort() ==
        [['balance.elements', 'R_ADK'], ['balance.elements', 'R_HEX'], ['balance.elements', 'R_PFK'], ['balance.elements', 'R_PYK']]
def causes = all.findAll { it.ruleId == 'balance.common-cause' }
assert causes.size() == 1
def c = causes[0]
assert c.elementId == 'atp_c' && c.severity == 'warning' && c.line > 0
assert c.data == [contradicting: '', declared: 'C30H12N5O13P3', 'delta.C': '20', reactionCount: '4',
                  reactions: 'R_ADK,R_HEX,R_PFK,R_PYK', species: 'atp_c', suggested: 'C10H12N5O13P3']
assert report.summary.failed == true
return true
