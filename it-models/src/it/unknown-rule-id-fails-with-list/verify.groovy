// A misspelt rule id in <severities> stops the build before any model is checked, and the error
// lists every known rule id (the checks' and the release gate's).
def log = new File(basedir, 'build.log').text
def line = log.readLines().find { it.contains("unknown rule id 'balance.chrage' in severities; did you mean 'balance.charge'? Known rule ids: ") }
assert line != null
def known = line.substring(line.indexOf('Known rule ids: ') + 'Known rule ids: '.length()).split(', ') as List
assert known.containsAll(['balance.charge', 'balance.elements', 'model.duplicate-id', 'model.baseline-stale',
                          'balance.regression', 'mapping.transitions-changed'])
assert known == known.toSorted()
assert !new File(basedir, 'target/atomledger/report.json').exists()
return true
