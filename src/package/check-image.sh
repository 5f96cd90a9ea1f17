#!/usr/bin/env bash
# Starts the application image the way a user does, headless: `baywright --help`, then `design` on the
# demo plan, and checks what they print. Run by `mvn -Prelease verify`; argument: PROJECT_DIR.
set -euo pipefail
cd "$1"
app=target/release/baywright/bin/baywright
[ -x "$app" ] || { echo "check-image: $app is missing" >&2; exit 1; }
unset DISPLAY || true
fail() { echo "check-image: $*" >&2; exit 1; }

help=$("$app" --help) || fail "--help exited $?"
for want in "Usage: baywright" "design" "Commands:" "licensed professional engineer"; do
  grep -qF -- "$want" <<<"$help" || fail "--help does not say \"$want\""
done

out=$("$app" design plans/harbourview-offices.bay.json) || fail "design on the demo exited $?"
for want in "Baywright design: Harbourview Offices" "Steel weight:" "No problems." "CAUTION:"; do
  grep -qF -- "$want" <<<"$out" || fail "design does not say \"$want\":
$out"
done
grep -q "Unsupported JavaFX configuration" <<<"$out" && fail "a JavaFX warning reached the console"
size=$(du -sm target/release/baywright | cut -f1)
echo "check-image: the image starts by name with its own runtime ($size MB): --help and design on the demo as expected"
echo "$out" | sed -n 3p
