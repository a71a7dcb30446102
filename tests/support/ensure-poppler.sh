#!/usr/bin/env bash
# Install Debian's poppler-utils (pdftotext, pdftoppm) when missing: the record PDF tests read the
# PDF's text back with them. Needs root, as CI has.
set -euo pipefail
if command -v pdftotext >/dev/null && command -v pdftoppm >/dev/null; then exit 0; fi
echo "Installing poppler-utils from Debian's packages…"
SUDO=""; [ "$(id -u)" -ne 0 ] && SUDO="sudo"
$SUDO apt-get update -qq
DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq poppler-utils >/dev/null
