// A pathway traced with the expected fates: every threonine carbon is followed to glycine or
// acetyl-CoA, every declared fate holds, and nothing about the traces is reported.
import groovy.json.JsonSlurper

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def model = report.models[0]
def all = model.findings + model.reactions.collectMany { it.findings }
assert all.findAll { it.ruleId.startsWith('trace.') }.isEmpty()
assert all.findAll { it.severity != 'info' }.isEmpty()

def traces = new JsonSlurper().parse(new File(basedir, 'target/atomledger/traces.json')).traces
assert traces.size() == 1
def t = traces[0]
assert t.model == 'models/threonine.xml' && t.pathway == 'threonine' && t.source == 'thr_c'
assert t.steps.collect { it.step } == ['R_TDH', 'R_KBL']
def fates = t.carbons.collectEntries { [it.label, [it.status, it.fate.species, it.fate.label, it.fate.step]] }
assert fates == [C1: ['decided', 'gly_c', 'C1', 'R_KBL'], C2: ['decided', 'gly_c', 'C2', 'R_KBL'],
                 C3: ['decided', 'accoa_c', 'C1', 'R_KBL'], C4: ['decided', 'accoa_c', 'C2', 'R_KBL']]
assert t.carbons.every { it.atom instanceof Integer && it.path.size() == 2 }
assert t.expectations.collect { it.verdict } == ['holds', 'holds', 'holds', 'holds']
def log = new File(basedir, 'build.log').text
assert log.contains('pathway threonine: 4 carbons: 2 acetyl-CoA, 2 glycine; fates: 4 hold')
return true
