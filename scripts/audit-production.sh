#!/usr/bin/env bash
# `npm run audit:prod`: npm audit of the packages that ship (no dev dependencies). Fails (1) on any high or
# critical advisory; says so and exits 2 when the registry does not answer audit requests, so a missing
# audit is never mistaken for a clean one.
set -uo pipefail
cd "$(dirname "$0")/.."
out=$(npm audit --omit=dev --json 2>/dev/null)
echo "$out" | node -e '
  let text = "";
  process.stdin.on("data", (d) => (text += d)).on("end", () => {
    let report;
    try { report = JSON.parse(text); } catch { report = {}; }
    const v = report.metadata?.vulnerabilities;
    if (!v) {
      console.error(`npm audit gave no report (${report.error?.summary ?? "no answer from the registry"}): not audited.`);
      process.exit(2);
    }
    const bad = Object.values(report.vulnerabilities ?? {}).filter((x) => x.severity === "high" || x.severity === "critical");
    for (const x of bad) console.log(`${x.severity}: ${x.name} ${x.range} (fix: ${JSON.stringify(x.fixAvailable)})`);
    console.log(`npm audit --omit=dev: ${v.critical} critical, ${v.high} high, ${v.moderate} moderate, ${v.low} low`);
    process.exit(bad.length ? 1 : 0);
  });
'
