#!/bin/sh
# Regenerates the corpus workbooks: books.py -> .fods (make_fods.py) -> .xlsx and .ods saved
# by LibreOffice itself (headless). CI does not run this; the saved files are committed.
set -eu
cd "$(dirname "$0")"
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
python3 make_fods.py "$work"
for f in "$work"/*.fods; do
    soffice --headless -env:UserInstallation=file://"$work"/profile \
        --convert-to xlsx --outdir . "$f" >/dev/null
    soffice --headless -env:UserInstallation=file://"$work"/profile \
        --convert-to ods --outdir . "$f" >/dev/null
done
cp "$work"/*.expect .
for s in "$work"/*.cells.plumb; do [ -e "$s" ] && cp "$s" .; done
