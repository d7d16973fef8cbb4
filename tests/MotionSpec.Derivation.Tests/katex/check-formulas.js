#!/usr/bin/env node
// Reads a JSON array of formulas ({ "tex": "...", "display": true|false, "where": "..." } or plain strings)
// from the file named by the first argument, or from standard input, and parses each with KaTeX.
// Strict mode is on, so constructs that KaTeX accepts only as an extension of LaTeX count as failures too:
// the same formulas go into the LaTeX document.
// Prints one JSON object: { "checked": N, "failures": [ { "index", "where", "tex", "error" } ] }.
// Exit code: 0 all parsed, 1 some failed, 2 the input could not be read.
'use strict';
const fs = require('fs');
const katex = require('katex');

function readInput() {
  const path = process.argv[2];
  return path && path !== '-' ? fs.readFileSync(path, 'utf8') : fs.readFileSync(0, 'utf8');
}

let formulas;
try {
  formulas = JSON.parse(readInput());
  if (!Array.isArray(formulas)) throw new Error('expected a JSON array of formulas');
} catch (e) {
  process.stderr.write('cannot read the formulas: ' + e.message + '\n');
  process.exit(2);
}

const failures = [];
formulas.forEach((item, index) => {
  const f = typeof item === 'string' ? { tex: item } : item;
  try {
    katex.renderToString(f.tex, { displayMode: !!f.display, throwOnError: true, strict: 'error' });
  } catch (e) {
    failures.push({ index, where: f.where || '', tex: f.tex, error: String(e.message || e) });
  }
});

process.stdout.write(JSON.stringify({ checked: formulas.length, katex: katex.version, failures }) + '\n');
process.exit(failures.length === 0 ? 0 : 1);
