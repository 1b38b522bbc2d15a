// A curated map with two carbons swapped fails the build, naming the reaction and the carbons.
import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def fba = report.models[0].reactions.find { it.id == 'R_FBA' }
def errors = report.models[0].reactions.collectMany { it.findings }.findAll { it.severity == 'error' }
assert errors.collect { [it.ruleId, it.elementId] } == [['mapping.curated-differs', 'R_FBA']]
assert errors[0].data.differing == 'fdp#1:6->dhap#1:2,fdp#1:19->dhap#1:5'
assert (errors[0].data.extraCost as int) > 0
assert fba.mapping.status == 'mapped'
assert new File(basedir, 'build.log').text.contains('mapping.curated-differs (1): R_FBA')
return true
