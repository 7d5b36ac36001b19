#!/usr/bin/env python3
"""The codes-only sheet a blind case writer gets: fault titles, symptom texts, measurement units,
check titles with minutes, bypass and outcomes. No probabilities, rules or cases.

Usage: src/analysis/codes-sheet.py > /somewhere/outside/the/repo/REFERENCE.md   (needs PyYAML)
"""
import pathlib
import yaml

catalogue = pathlib.Path(__file__).resolve().parents[2] / "rules" / "catalogue"
faults = yaml.safe_load((catalogue / "faults.yaml").read_text())["faults"]
symptoms = yaml.safe_load((catalogue / "symptoms.yaml").read_text())["symptoms"]
checks = yaml.safe_load((catalogue / "checks.yaml").read_text())["checks"]
measurements = yaml.safe_load((catalogue / "quantities.yaml").read_text())["measurements"]

print("# Codes-only reference sheet (no probabilities, no rules)\n")
print("## Faults (the truth of a case is one of these; file name = fault code)\n")
for code, f in faults.items():
    print(f"- `{code}`: {f['title']}")
print("\n## Symptoms (request `symptoms` / `absentSymptoms`)\n")
for code, s in symptoms.items():
    print(f"- `{code}`: {s['text']}")
print("\n## Measurements (request `measurements`: quantity, value, unit)\n")
for code, q in measurements.items():
    print(f"- `{code}` ({q['kind']}): units {', '.join(q['units'])}")
print("\n## Checks (case `answers`: check code -> one outcome; first outcome listed is the normal one)\n")
for code, c in checks.items():
    bypass = ", valve bypassed" if c.get("bypass") else ""
    print(f"- `{code}`: {c['title']} ({c['minutes']} min{bypass}); outcomes: {', '.join(c['outcomes'])}")
