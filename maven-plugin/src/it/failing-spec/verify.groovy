// The build failed on the contradictory spec, named by its path with the relation that breaks it.
def log = new File(basedir, 'build.log').text
assert log.contains('[ERROR] rootform: src/main/rootform/contradictory.json: the conditions are inconsistent: every solution has x[0] + x[2] = 0')
assert log.contains('BUILD FAILURE')
