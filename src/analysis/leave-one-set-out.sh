#!/usr/bin/env bash
# What the symptom tables could gain from case-like data: for each held-out set, revise every
# P(symptom reported | fault) in a scratch copy by a Beta update toward how often the OTHER sets'
# cases of that fault report the symptom (the table's value counts as K cases, default 4), then
# replay the evaluation and print the left-out set's top-3 from the first request. Nothing in the
# working tree changes; the shipped tables are not revised this way (symptom rows would stop
# agreeing with the checks that measure them, see SymptomCheckCoherenceTest).
#
# Usage: src/analysis/leave-one-set-out.sh [K]     (needs python3 with PyYAML; ~1 min per set)
set -euo pipefail
K=${1:-4}
ROOT=$(git rev-parse --show-toplevel)
WORK=$(mktemp -d)
trap 'rm -rf "$WORK"' EXIT
git -C "$ROOT" archive HEAD | tar -x -C "$WORK"
cd "$WORK"
SETS=$(ls -d src/test/resources/cases* | xargs -n1 basename)
cat > fit.py <<'PY'
import collections, glob, sys, yaml
k, train = float(sys.argv[1]), sys.argv[2].split(',')
path = 'rules/catalogue/symptoms.yaml'
table = yaml.safe_load(open(path))
cases = [c for d in train for f in glob.glob(f'src/test/resources/{d}/*.yaml') for c in yaml.safe_load(open(f))]
n = collections.Counter(c['truth'] for c in cases)
x = collections.defaultdict(collections.Counter)
for c in cases:
    for s in c['request'].get('symptoms') or []:
        x[s][c['truth']] += 1
for code, s in table['symptoms'].items():
    given = dict(s.get('given') or {})
    for f in n:
        p = (k * given.get(f, s['otherwise']) + x[code][f]) / (k + n[f])
        given[f] = round(min(0.97, max(0.01, p)), 3)
    s['given'] = given
yaml.safe_dump(table, open(path, 'w'), sort_keys=False)
PY
cp rules/catalogue/symptoms.yaml symptoms.orig
for held in $SETS; do
  [ "$held" = cases ] && continue
  cp symptoms.orig rules/catalogue/symptoms.yaml
  python3 fit.py "$K" "$(echo "$SETS" | grep -vx "$held" | paste -sd,)"
  ./mvnw -B -q -o test -Dtest='dev.positioner.evaluation.EvaluationTest#everyCaseWasReplayedAndEverySessionEnded' >/dev/null 2>&1 || true
  # The report's per-case table: | id | truth | first-request rank | ...
  python3 - "$held" <<'PY'
import glob, re, sys, yaml
held = sys.argv[1]
ids = {c['id'] for f in glob.glob(f'src/test/resources/{held}/*.yaml') for c in yaml.safe_load(open(f))}
rows = re.findall(r'^\| ([a-z_]+-[0-9a-z]+)(?: \(atypical\))? \| [a-z_]+ \| (\d+) \|', open('target/evaluation-report.md').read(), re.M)
ranks = [int(r) for i, r in rows if i in ids]
print(f"{held}: top-3 from the first request {100 * sum(r <= 3 for r in ranks) / len(ranks):.1f} % of {len(ranks)} cases")
PY
done
