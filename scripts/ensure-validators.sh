#!/usr/bin/env bash
# Make sure the outside validators the tests use are present:
#   python3-ezdxf (DXF reader + audit, run with /usr/bin/python3), python3-shapely
#   (polygon validity, overlaps, areas), admesh (STL),
#   linuxcnc-uspace (rs274, the standalone RS274NGC interpreter), poppler-utils (PDF),
#   chromium (the browser test of the local page).
# Installs the missing ones with apt-get when running as root; otherwise says what to install.
set -euo pipefail
need=()
/usr/bin/python3 -c 'import ezdxf' >/dev/null 2>&1 || need+=(python3-ezdxf)
/usr/bin/python3 -c 'import shapely' >/dev/null 2>&1 || need+=(python3-shapely)
command -v admesh >/dev/null 2>&1 || need+=(admesh)
command -v rs274 >/dev/null 2>&1 || need+=(linuxcnc-uspace)
command -v pdftoppm >/dev/null 2>&1 || need+=(poppler-utils)
command -v chromium >/dev/null 2>&1 || need+=(chromium)
if [ ${#need[@]} -eq 0 ]; then exit 0; fi
if [ "$(id -u)" -ne 0 ]; then
  echo "umbrafab tests need these Debian packages: ${need[*]}" >&2
  echo "install them with: sudo apt-get update && sudo apt-get install -y ${need[*]}" >&2
  exit 1
fi
echo "installing test validators: ${need[*]}" >&2
export DEBIAN_FRONTEND=noninteractive
apt-get update -qq
apt-get install -y -qq --no-install-recommends "${need[@]}" >/dev/null
