// Issue #12: CDK cannot lay out this reaction's map; the run still writes every report, and the
// HTML report draws the molecules one by one and says why on the reaction's card.
import groovy.json.JsonSlurper

def out = new File(basedir, 'target/atomledger')
['report.json', 'report.html', 'junit/TEST-atomledger.xml', 'report.sarif', 'summary.md'].each {
    assert new File(out, it).isFile() : "missing report $it"
}
def report = new JsonSlurper().parse(new File(out, 'report.json'))
def reaction = report.models[0].reactions.find { it.id == 'R_PPPGO' }
assert reaction.mapping.status == 'best-found'
def findings = report.models[0].reactions.collectMany { it.findings }.findAll { it.severity != 'info' }
assert findings.collect { [it.ruleId, it.elementId, it.severity] } == [['mapping.budget-reached', 'R_PPPGO', 'warning']]

def html = new File(out, 'report.html').getText('UTF-8')
def card = html.substring(html.indexOf('id="m0-R_PPPGO"'))
card = card.substring(0, card.indexOf('</article>'))
assert card.contains('<li>Drawing: CDK could not lay out the mapped reaction (NullPointerException in RingPlacer')
def picture = (card =~ /--pic:url\(pictures\/([0-9a-f]{32}\.svg)\)/)[0][1]
assert new File(out, 'pictures/' + picture).getText('UTF-8').contains('protoporphyrin IX')
return true
