// A Level 2 model with FORMULA:/CHARGE: notes is read and every reaction balances.
import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def model = report.models[0]
assert model.level == 2 && model.version == 4
assert model.reactions*.id == ['R_HEX', 'R_PGI', 'R_ATPM']
model.reactions.each {
    assert it.balance.computable : it.id
    assert it.balance.elements == [:] : it.id
    assert it.balance.charge == '0' : it.id
    assert it.findings.isEmpty() : it.id
}
assert model.findings.isEmpty()
return true
