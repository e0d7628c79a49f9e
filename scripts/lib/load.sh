# shellcheck shell=bash
# Sources every bootstrap library in dependency order.
_tauline_lib="$(dirname "${BASH_SOURCE[0]}")"
for _tauline_part in defaults common locks process deps postgres postgres-cluster postgres-db app-env services welcome; do
  # shellcheck source=/dev/null
  source "$_tauline_lib/$_tauline_part.sh"
done
unset _tauline_lib _tauline_part
