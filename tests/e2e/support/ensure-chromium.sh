#!/usr/bin/env bash
# Install Debian's Chromium for the browser tests when it is missing (needs root, as CI has).
set -euo pipefail
if [ -x /usr/bin/chromium ]; then exit 0; fi
echo "Installing Chromium from Debian's packages…"
SUDO=""; [ "$(id -u)" -ne 0 ] && SUDO="sudo"
$SUDO apt-get update -qq
DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq chromium >/dev/null
