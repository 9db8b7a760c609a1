#!/bin/sh
# Firnline in any CI service: a POSIX shell recipe. Run it from the root of a docs repository
# that has firnline installed (npm install --save-dev firnline) and a full git history.
#
#   FIRNLINE_BASE   a git revision to compare with, e.g. origin/main for a pull request;
#                   leave it empty to check and require sign-off for every claim.
#   FIRNLINE        how to run Firnline (default: npx firnline).
#
# Exit status: 0 every claim in scope signed off and no unreviewed error; 1 something to review;
# 2 a usage, settings or rule-pack error. The SARIF report is written to firnline.sarif either way,
# for a code-scanning view or as a build artefact.
set -u

FIRNLINE="${FIRNLINE:-npx firnline}"
BASE="${FIRNLINE_BASE:-}"

if [ -n "$BASE" ]; then
  set -- --changed-since "$BASE"
else
  set --
fi

# 1. The flags, as SARIF 2.1.0, for the annotations view. A report is not a verdict: go on to the gate.
$FIRNLINE check "$@" --format sarif -o firnline.sarif
status=$?
if [ "$status" -ge 2 ]; then
  exit "$status"
fi

# 2. The gate: every claim in scope has a current sign-off in firnline-signoffs.yaml.
#    Its summary lists open claims and claims changed since sign-off, old wording beside new.
$FIRNLINE check "$@" --require-signoff
status=$?
if [ "$status" -ne 0 ]; then
  echo "To sign off: $FIRNLINE checklist -o checklist.md, tick the boxes, then $FIRNLINE signoff --from checklist.md --by \"Your Name\"" >&2
fi
exit "$status"
