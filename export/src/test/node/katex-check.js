// Parses each file named on the command line with KaTeX (throwOnError, strict); exits 1 on the first error.
const fs = require('fs');
const katex = require('katex');
for (const file of process.argv.slice(2)) {
  const expr = fs.readFileSync(file, 'utf8');
  try {
    katex.renderToString(expr, { throwOnError: true, strict: 'error', displayMode: true });
  } catch (e) {
    console.error(file + ': ' + e.message);
    process.exit(1);
  }
}
console.log('ok');
