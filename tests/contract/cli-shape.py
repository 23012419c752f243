#!/usr/bin/env python3
# Our own contract check for the waymark-stats command line (key names and finite numbers, not
# values), kept in the repo from the project's shared checks folder (checks/cli-shape) so CI can
# run it. Run from the repo root after `npm run build -w @waymark/stats`.
"""Checks the shape of `waymark-stats` output against the contract in the stats issue: every key present, numbers finite.
Run from the project root after install and build:  ../shared/checks/cli-shape
It checks names and types only, not values: the values are for the reference suite to prove."""
import json, math, os, subprocess, sys, tempfile

def run(args):
    r = subprocess.run(["npx", "--no-install", "waymark-stats", *args], capture_output=True, text=True, timeout=120)
    if r.returncode != 0:
        sys.exit("waymark-stats %s failed: %s" % (" ".join(args[:1]), (r.stderr or r.stdout).strip()[:300]))
    return json.loads(r.stdout)

tmp = tempfile.mkdtemp()
path = os.path.join(tmp, "orchard.csv")
rows = {"Row A": [4.1, 4.5, 3.9, 4.8, 4.2, 4.4], "Row B": [5.0, 5.6, 4.9, 5.3, 5.8, 5.1], "Row C": [4.6, 4.3, 5.2, 4.9, 4.4, 4.7]}
with open(path, "w", encoding="utf-8") as f:
    f.write('"Orchard row","Fruit mass (kg)"\n')
    for g, vs in rows.items():
        for v in vs: f.write('"%s",%s\n' % (g, v))
out = run(["analyze", path, "--group", "Orchard row", "--outcome", "Fruit mass (kg)", "--json"])
need = {
    "anova": ["F", "df1", "df2", "p", "ssBetween", "ssWithin", "etaSquared", "omegaSquared"],
    "welch": ["F", "df1", "df2", "p"], "kruskalWallis": ["H", "df", "p", "epsilonSquared"],
    "levene": ["F", "df1", "df2", "p"], "brownForsythe": ["F", "df1", "df2", "p"], "bartlett": ["statistic", "df", "p"],
}
problems = []
def num(where, v):
    if not isinstance(v, (int, float)) or isinstance(v, bool) or not math.isfinite(v): problems.append("%s is not a finite number: %r" % (where, v))
for sec, keys in need.items():
    if not isinstance(out.get(sec), dict): problems.append("missing object %s" % sec); continue
    for k in keys: num("%s.%s" % (sec, k), out[sec].get(k))
groups = out.get("groups")
if not isinstance(groups, list) or len(groups) != 3: problems.append("groups should list 3 groups")
else:
    for g in groups:
        for k in ["n", "mean", "sd", "median"]: num("groups[%s].%s" % (g.get("name"), k), g.get(k))
sw = out.get("shapiroWilk")
if not isinstance(sw, list) or {s.get("group") for s in sw} != set(rows): problems.append("shapiroWilk should have one entry per group, by name")
else:
    for s in sw: num("shapiroWilk[%s].W" % s["group"], s.get("W")); num("shapiroWilk[%s].p" % s["group"], s.get("p"))
ph = out.get("posthoc") or {}
for fam, keys in {"tukey": ["diff", "lower", "upper", "pAdj"], "gamesHowell": ["diff", "df", "pAdj"], "dunn": ["z", "p", "pAdj"]}.items():
    pairs = ph.get(fam)
    if not isinstance(pairs, list) or len(pairs) != 3: problems.append("posthoc.%s should hold the 3 pairs" % fam); continue
    for x in pairs:
        if x.get("a") not in rows or x.get("b") not in rows: problems.append("posthoc.%s pair names %r/%r are not group names" % (fam, x.get("a"), x.get("b")))
        for k in keys: num("posthoc.%s.%s" % (fam, k), x.get(k))
rec = out.get("recommendation") or {}
if rec.get("test") not in ("anova", "welch", "kruskal-wallis"): problems.append("recommendation.test is %r" % rec.get("test"))
if not isinstance(rec.get("reasons"), list) or not rec.get("reasons"): problems.append("recommendation.reasons is empty")
pw = run(["power", "--groups", "3", "--effect-f", "0.4", "--alpha", "0.05", "--power", "0.8", "--json"])
num("power.nPerGroup", pw.get("nPerGroup")); num("power.power", pw.get("power"))
pw2 = run(["power", "--groups", "3", "--effect-f", "0.4", "--n", "20", "--json"])
num("power(--n).power", pw2.get("power"))
for p in problems: print(" -", p)
print("cli shape: %d problems" % len(problems))
sys.exit(1 if problems else 0)
