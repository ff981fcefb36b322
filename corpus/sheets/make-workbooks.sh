#!/bin/sh
# Regenerates the corpus workbooks: books.py -> .fods (make_fods.py) -> .xlsx and .ods saved
# by LibreOffice itself (headless). CI does not run this; the saved files are committed.
set -eu
cd "$(dirname "$0")"
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
python3 make_fods.py "$work"
for f in "$work"/*.fods; do
    name=$(basename "$f" .fods)
    folder=$(cat "$work/$name.folder")
    mkdir -p "$folder"
    soffice --headless -env:UserInstallation=file://"$work"/profile \
        --convert-to xlsx --outdir "$folder" "$f" >/dev/null
    soffice --headless -env:UserInstallation=file://"$work"/profile \
        --convert-to ods --outdir "$folder" "$f" >/dev/null
    cp "$work/$name.expect" "$folder/"
    if [ -e "$work/$name.cells.plumb" ]; then cp "$work/$name.cells.plumb" "$folder/"; fi
done
