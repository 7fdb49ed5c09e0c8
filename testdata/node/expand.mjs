// expand.mjs CONTEXT reads a JSON list of JSON-LD documents on standard
// input, expands each and converts it to RDF with jsonld.js in safe mode
// (which fails on any term or value it would drop), and prints a JSON
// list of their N-Quads. The Linked
// Art context is read from the file CONTEXT: nothing is fetched, and any
// other remote document is an error.
import jsonld from 'jsonld';
import { readFileSync } from 'node:fs';

const LINKED_ART = 'https://linked.art/ns/v1/linked-art.json';
const context = JSON.parse(readFileSync(process.argv[2], 'utf8'));
const documentLoader = async (url) => {
  if (url === LINKED_ART) {
    return { contextUrl: null, document: context, documentUrl: url };
  }
  throw new Error(`refusing to fetch ${url}: only the shipped Linked Art context is known`);
};
const out = [];
for (const doc of JSON.parse(readFileSync(0, 'utf8'))) {
  await jsonld.expand(doc, { documentLoader, safe: true });
  out.push(await jsonld.toRDF(doc, { format: 'application/n-quads', documentLoader, safe: true }));
}
process.stdout.write(JSON.stringify(out));
