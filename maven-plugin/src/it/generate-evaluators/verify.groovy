// The first build generated three evaluators; the second found every spec unchanged.
def log = new File(basedir, 'build.log').text
assert log.contains('rootform: 3 evaluator(s) generated, 0 up to date, 0 removed')
assert log.contains('rootform: 0 evaluator(s) generated, 3 up to date, 0 removed')
assert log.contains('Tests run: 3, Failures: 0, Errors: 0, Skipped: 0')
assert new File(basedir, 'target/generated-sources/rootform/com/example/evaluators/Swing.java').text.contains('public final class Swing')
