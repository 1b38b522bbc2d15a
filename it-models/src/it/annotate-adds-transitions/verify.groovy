// annotate writes every proven map into the demo model, exactly as the golden file, and adds
// nothing else; check then passes on the annotated model.
import groovy.json.JsonSlurper

def annotated = new File(basedir, 'models/ledgerella_central.xml').text
def golden = new File(basedir, 'expected/ledgerella_central.xml').text
assert annotated == golden

// Removing our elements (and the annotation wrappers we created) gives back the original bytes.
def stripped = annotated
        .replaceAll(/(?s)\n\s*<annotation>\s*<atl:atomTransitions.*?<\/atl:atomTransitions>\s*<\/annotation>/, '')
        .replaceAll(/(?s)\s*<atl:atomTransitions.*?<\/atl:atomTransitions>/, '')
def original = new File(basedir, '../../../src/it/annotate-adds-transitions/models/ledgerella_central.xml').text
assert stripped == original

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def model = report.models[0]
assert model.summary.findings.error == 0
def statuses = model.reactions.collect { it.mapping.status }.countBy { it }
assert statuses.mapped == annotated.count('<atl:atomTransitions')
assert model.reactions.find { it.id == 'R_HEX' }.mapping.carbon.size() == 16
assert model.reactions.findAll { it.class == 'exchange' }.every { it.mapping.status == 'skipped' }
return true
