// Without <formats> the goal writes every report format into target/atomledger; each names the
// failing reaction R_HEX (proton missing from the products).
import groovy.json.JsonSlurper

def dir = new File(basedir, 'target/atomledger')
assert dir.list().toList().toSorted() == ['junit', 'report.html', 'report.json', 'report.sarif', 'summary.md']
assert new File(dir, 'junit').list().toList() == ['TEST-atomledger.xml']

def sarif = new JsonSlurper().parse(new File(dir, 'report.sarif'))
assert sarif.version == '2.1.0'
def errors = sarif.runs[0].results.findAll { it.level == 'error' }
assert errors.collect { [it.ruleId, it.locations[0].logicalLocations[0].name] } ==
        [['balance.charge', 'R_HEX'], ['balance.elements', 'R_HEX']]
assert errors.every { it.locations[0].physicalLocation.artifactLocation.uri == 'models/upper_glycolysis.xml' }

def junit = javax.xml.parsers.DocumentBuilderFactory.newInstance().newDocumentBuilder()
        .parse(new File(dir, 'junit/TEST-atomledger.xml'))
def failed = javax.xml.xpath.XPathFactory.newInstance().newXPath()
        .evaluate('//testcase[failure]', junit, javax.xml.xpath.XPathConstants.NODESET)
assert failed.length == 1
assert failed.item(0).getAttribute('classname') == 'upper_glycolysis.balance'
assert failed.item(0).getAttribute('name') == 'R_HEX'

assert new File(dir, 'summary.md').text.startsWith('## AtomLedger: failed\n')
def html = new File(dir, 'report.html').text
assert html.startsWith('<!DOCTYPE html>') && html.contains('id="m0-R_HEX"') && !html.contains('<script')
return true
