// Species resolved through cross-references from an SD file (ChEBI layout), a molfile directory and an
// InChIKey table; the coverage ranking in the report; exported RXN files read back by CDK's own RXN
// reader (general-purpose reference library) with the same carbon pairs as the report.
import groovy.json.JsonSlurper
import org.openscience.cdk.io.MDLRXNV2000Reader
import org.openscience.cdk.silent.SilentChemObjectBuilder

def report = new JsonSlurper().parse(new File(basedir, 'target/atomledger/report.json'))
def model = report.models[0]
def byId = model.reactions.collectEntries { [it.id, it] }
assert byId.R_PYK.mapping.status == 'mapped' && byId.R_ENO.mapping.status == 'mapped'
['R_X1', 'R_X2', 'R_ACP', 'R_Y1'].each { assert byId[it].mapping.status == 'no-structure' }

def c = model.coverage
assert c.sources == ['cross-reference': 5, 'notes': 2]
assert [c.considered, c.mappable, c.blocked, c.blockedOnlyByGeneric] == [6, 2, 4, 1]
assert c.missing.collect { [it.species, it.unblocks, it.blocks] } == [['M_x_c', 1, 2], ['M_y_c', 1, 1]]
assert c.generic.collect { [it.species, it.reason] } == [['M_acp_c', 'R group in formula']]

def all = model.findings + model.reactions.collectMany { it.findings }
def about = all.findAll { it.ruleId.startsWith('mapping.') || it.ruleId.startsWith('structure.') }
assert about.collect { [it.ruleId, it.elementId, it.severity] }.sort { it[0] } == [
        ['mapping.generic-species', 'ledgerella_lower_it', 'info'],
        ['mapping.structure-missing', 'ledgerella_lower_it', 'warning']]
assert about.find { it.ruleId == 'mapping.structure-missing' }.data.species == 'M_x_c,M_y_c'

def maps = new File(basedir, 'target/atomledger/maps')
assert maps.list().sort() == ['R_ENO.rxn', 'R_PYK.rxn', 'carbon-transitions.tsv']
['R_PYK', 'R_ENO'].each { id ->
    def rxn = new MDLRXNV2000Reader(new StringReader(new File(maps, id + '.rxn').text))
            .read(SilentChemObjectBuilder.getInstance().newReaction())
    def atoms = { set ->
        def out = [:]
        set.atomContainers().each { mol ->
            int heavy = 0
            mol.atoms().each { a ->
                if (a.atomicNumber != 1) {
                    heavy++
                    if (a.mapIdx > 0) out[a.mapIdx] = mol.title + '#1:' + heavy
                }
            }
        }
        out
    }
    def left = atoms(rxn.reactants)
    def right = atoms(rxn.products)
    def carbonPairs = left.findAll { k, v -> right.containsKey(k) }.collect { k, v -> v + '>' + right[k] }
    def expected = byId[id].mapping.carbon.collect { t ->
        "${t.from.species}#${t.from.copy}:${t.from.atom}>${t.to.species}#${t.to.copy}:${t.to.atom}".toString() }
    assert carbonPairs.containsAll(expected) : "$id: CDK reads $carbonPairs, the report has $expected"
}
def tsv = new File(maps, 'carbon-transitions.tsv').readLines()
assert tsv.size() == 1 + byId.R_PYK.mapping.carbon.size() + byId.R_ENO.mapping.carbon.size()
return true
