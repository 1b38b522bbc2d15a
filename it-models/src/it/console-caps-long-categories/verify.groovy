// Every category of the console is capped: 10 lines per failing rule, 3 per warning rule, then
// "and N more (see report)" at the same level (issue #13). The report still has everything.
import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def all = report.models[0].reactions.collectMany { it.findings } + report.models[0].findings
assert all.count { it.ruleId == 'balance.charge' } == 14
assert all.count { it.ruleId == 'balance.elements' } == 14
assert all.count { it.ruleId == 'model.formula-missing' } == 10
def lines = new File(basedir, 'build.log').readLines()
def block = { String rule ->
    int start = lines.findIndexOf { it.contains("   ${rule} (") }
    assert start >= 0
    lines.subList(start + 1, lines.size()).takeWhile { it =~ /^\[(ERROR|WARNING)\]     / }
}
def charge = block('balance.charge')
assert charge.size() == 11 && charge.every { it.startsWith('[ERROR]') }
assert charge[0] ==~ /\[ERROR\]     R_DISS01 dissociation 1, written without its proton \(models\/many_gaps.xml:\d+\): charge -1: the products' total charge is one lower/
assert charge[10] == '[ERROR]     and 4 more (see report)'
def missing = block('model.formula-missing')
assert missing.size() == 4 && missing.every { it.startsWith('[WARNING]') }
assert missing[3] == '[WARNING]     and 7 more (see report)'
return true
