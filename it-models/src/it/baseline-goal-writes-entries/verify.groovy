// The baseline goal rewrote the file: the reasoned R_HEX charge entry kept, three new entries with
// the placeholder reason and the given owner, the stale R_PGI entry gone, sorted. The check that
// followed failed: placeholder reasons accept nothing.
import groovy.json.JsonSlurper

def lines = new File(basedir, 'models/atomledger-baseline.tsv').readLines()
def rows = lines.findAll { !it.startsWith('#') }
assert rows[0] == 'model\trule\telement\tfingerprint\tacceptedBy\treason'
def entries = rows.drop(1).collect { it.split('\t', -1) as List }
assert entries.collect { [it[1], it[2], it[4], it[5]] } == [
        ['balance.charge', 'R_ATPM', 'jdoe', 'TODO: say why this finding is accepted'],
        ['balance.charge', 'R_HEX', 'mkrause', 'proton lumped into the cytosolic pool'],
        ['balance.elements', 'R_ATPM', 'jdoe', 'TODO: say why this finding is accepted'],
        ['balance.elements', 'R_HEX', 'jdoe', 'TODO: say why this finding is accepted']]
assert entries.every { it[0] == 'models/upper_glycolysis.xml' && it[3] ==~ /[0-9a-f]{16}/ }
assert entries.find { it[2] == 'R_HEX' && it[1] == 'balance.charge' }[3] == 'eb2d860d44f8139f'
assert !new File(basedir, 'models/atomledger-baseline.tsv').text.contains('\r')

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def model = report.models[0]
def errors = model.reactions.collectMany { it.findings }.findAll { it.severity == 'error' }
assert errors.collect { [it.ruleId, it.elementId, it.baseline] }.toSorted { it.toString() } == [
        ['balance.charge', 'R_ATPM', 'pending-reason'],
        ['balance.charge', 'R_HEX', 'accepted'],
        ['balance.elements', 'R_ATPM', 'pending-reason'],
        ['balance.elements', 'R_HEX', 'pending-reason']]
assert report.summary.failed == true
assert report.summary.gate.baseline.stale == 0
return true
