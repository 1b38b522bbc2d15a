// With reviewMargin 2: the runner-up pinned by a curator is accepted as "criterion undecided", a pin
// 4 weighted bond edits off still fails the build, and the unpinned map is flagged for review with
// its runner-up in every report format.
import groovy.json.JsonSlurper

def dir = new File(basedir, 'target/atomledger')
def report = new JsonSlurper().parse(new File(dir, 'report.json'))
def reactions = report.models[0].reactions.collectEntries { [it.id, it] }
def mine = { id -> reactions[id].findings.findAll { it.ruleId in ['mapping.review', 'mapping.curated-undecided',
        'mapping.curated-differs'] }.collect { [it.ruleId, it.severity] } }

assert mine('R_TPI') == [['mapping.review', 'warning']]
assert mine('R_TPI_RUNNER_UP') == [['mapping.curated-undecided', 'info']]
assert mine('R_TPI_FAR') == [['mapping.curated-differs', 'error']]
def errors = report.models[0].reactions.collectMany { it.findings }.findAll { it.severity == 'error' }
assert errors.collect { [it.ruleId, it.elementId] } == [['mapping.curated-differs', 'R_TPI_FAR']]

def review = reactions['R_TPI'].findings.find { it.ruleId == 'mapping.review' }
assert review.data.reasons == 'margin' && review.data.margin == '2'
assert review.data.runnerUp == 'dhap: 2 3 5 = g3p: 5 3 2'
assert reactions['R_TPI_RUNNER_UP'].findings.find { it.ruleId == 'mapping.curated-undecided' }.data.extraCost == '2'
assert (reactions['R_TPI_FAR'].findings.find { it.ruleId == 'mapping.curated-differs' }.data.extraCost as int) == 4

def tpi = reactions['R_TPI'].mapping
assert reactions.values().every { it.mapping.status == 'mapped' }
assert tpi.margin == 2 && tpi.marginProven == true
assert tpi.runnerUp.cost == 4
assert tpi.runnerUp.carbon.collect { [it.from.atom, it.to.atom] }.toSorted() == [[2, 5], [3, 3], [5, 2]]

// The finding names the carbons at stake and where the runner-up sends them, in every format; the
// HTML also shows the runner-up's whole carbon map next to the drawing.
def moved = 'sends carbons dhap: 2 5 elsewhere (dhap: 2 5 = g3p: 5 2)'
assert review.message.contains(moved)
def sarif = new JsonSlurper().parse(new File(dir, 'report.sarif'))
assert sarif.runs[0].results.any { it.ruleId == 'mapping.review' && it.message.text.contains(moved) }
def junit = new File(dir, 'junit/TEST-atomledger.xml').text
assert junit.contains('mapping.review') && junit.contains(moved)
assert new File(dir, 'summary.md').text.contains(moved)
def html = new File(dir, 'report.html').text
assert html.contains('mapping.review') && html.contains(moved)
assert html.contains('Runner-up (4 weighted bond edits), carbon transitions:') && html.contains('<pre>dhap: 2 3 5 = g3p: 5 3 2</pre>')
assert new File(basedir, 'build.log').text.contains('mapping.curated-differs (1): R_TPI_FAR')
return true
