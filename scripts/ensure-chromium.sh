#!/usr/bin/env bash
# Makes sure Debian's Chromium is present for the browser tests. As root on Debian/Ubuntu it
# installs the package; otherwise it stops with the one command the user must run.
set -euo pipefail
chromium_path="${CHROMIUM_PATH:-/usr/bin/chromium}"
if [ -x "$chromium_path" ]; then exit 0; fi
if [ "$(id -u)" = "0" ] && command -v apt-get >/dev/null 2>&1; then
	echo "Installing Chromium for the browser tests (apt-get install -y chromium)…"
	export DEBIAN_FRONTEND=noninteractive
	apt-get update -qq
	apt-get install -y -qq chromium >/dev/null
	exit 0
fi
echo "The browser tests need Chromium at $chromium_path. Install it with:" >&2
echo "    sudo apt-get install -y chromium" >&2
echo "(or set CHROMIUM_PATH to a Chromium binary) and run npm test again." >&2
exit 1
