// A model with an external entity to a local file fails the build with a clear message, and the
// file's content leaks nowhere: not into the log, not into any file under target/.
def secret = new File(basedir, 'secret.txt').text.trim()
def log = new File(basedir, 'build.log').text
assert log.contains('models/leaky.xml:2: DOCTYPE declarations are refused')
assert !log.contains(secret)
def target = new File(basedir, 'target')
if (target.exists()) {
    target.eachFileRecurse { f -> assert !f.isFile() || !f.text.contains(secret) }
}
return true
