#!/usr/bin/env bash
# Audit the production dependencies (npm audit --omit=dev) and print the count of
# vulnerabilities per severity, high and critical first. Needs the npm registry (network),
# which is why this is a script and not a test. Exit status: 1 where any high or critical
# vulnerability is found, 2 where the audit itself could not run, else 0.
#
#   scripts/audit.sh            # summary and npm's report
#   scripts/audit.sh --quiet    # summary only
set -euo pipefail
cd "$(dirname "$0")/.."

json="$(mktemp)"
trap 'rm -f "$json"' EXIT

# npm audit exits non-zero when it finds vulnerabilities; the JSON says how many.
npm audit --omit=dev --json >"$json" 2>/dev/null || true

status=0
node - "$json" <<'EOF' || status=$?
const fs = require('fs');
const text = fs.readFileSync(process.argv[2], 'utf8');
let report;
try {
  report = JSON.parse(text);
} catch {
  console.error('npm audit gave no JSON report (is the registry reachable?):');
  console.error(text.slice(0, 2000));
  process.exit(2);
}
if (report.error) {
  const why = report.message || report.error.summary || report.error.detail || JSON.stringify(report.error);
  console.error(`npm audit could not run: ${why}`);
  console.error('(the registry must answer the audit endpoint; no vulnerability counts are available)');
  process.exit(2);
}
const v = (report.metadata && report.metadata.vulnerabilities) || {};
const deps = (report.metadata && report.metadata.dependencies) || {};
const n = (k) => Number(v[k] || 0);
console.log(`npm audit --omit=dev: high ${n('high')}, critical ${n('critical')} ` +
  `(moderate ${n('moderate')}, low ${n('low')}, info ${n('info')}; ` +
  `${deps.prod ?? '?'} production dependencies audited)`);
for (const [name, item] of Object.entries(report.vulnerabilities || {})) {
  if (item.severity === 'high' || item.severity === 'critical') {
    const via = (item.via || []).map((x) => (typeof x === 'string' ? x : x.title || x.url)).join('; ');
    console.log(`  ${item.severity}: ${name} ${item.range || ''}${via ? ` — ${via}` : ''}`);
  }
}
process.exit(n('high') + n('critical') > 0 ? 1 : 0);
EOF
if [ "$status" -eq 2 ]; then exit 2; fi

if [ "${1:-}" != "--quiet" ]; then
  echo
  npm audit --omit=dev || true
fi
exit "$status"
