// The third run reuses the first: same console lines, one note saying so, and report files byte for
// byte what a real run (the second, with reuse off) writes.
def log = new File(basedir, 'build.log').text
def note = 'no input changed since an earlier run'
assert log.count(note) == 1
def runs = log.split(/(?m)^\[INFO\] --- atomledger-maven-plugin/)
assert runs.size() >= 4
def summary = { String run -> run.readLines().findAll { it.contains('models/threonine.xml:') || it.contains('pathway threonine') } }
assert summary(runs[1]) && summary(runs[3]) == summary(runs[1])
assert runs[3].contains('report: target/atomledger/report.html')
assert !runs[3].contains('reading ')

def reused = new File(basedir, 'target/atomledger')
def fresh = new File(basedir, 'target/fresh')
def names = { File dir -> def out = []; dir.eachFileRecurse(groovy.io.FileType.FILES) { out << dir.toPath().relativize(it.toPath()).toString() }; out.sort() }
assert names(fresh).contains('report.html') && names(fresh).any { it.startsWith('pictures/') }
assert names(reused) == names(fresh)
// summary.md names its own folder; everything else is the same to the byte
names(fresh).findAll { it != 'summary.md' }.each { assert new File(reused, it).bytes == new File(fresh, it).bytes : it }
assert new File(reused, 'summary.md').text == new File(fresh, 'summary.md').text.replace('target/fresh/', 'target/atomledger/')
assert new File(basedir, 'target/map-cache/runs').isDirectory()
