// annotate without any species structure fails saying what to set, instead of reporting success and
// writing nothing (issue #13); the model is untouched.
def log = new File(basedir, 'build.log').text
assert log.contains('AtomLedger annotate: no species has a structure, so nothing can be annotated. Set atomledger.structures')
assert !new File(basedir, 'models/glycolysis.xml').text.contains('atomTransitions')
return true
