# shellcheck shell=bash
# The one place where the development and test defaults live. Every value can
# be overridden from the environment; README documents the demo credentials.
# Sourced by scripts/start.sh, scripts/stop.sh and scripts/test.sh.
# shellcheck disable=SC2034  # the other libraries read these

# PostgreSQL cluster of our own (not Debian's default 5432 cluster).
: "${PGPORT_TAULINE:=54329}"
: "${TAULINE_DB_NAME:=tauline}"
TAULINE_DB_ROLE=tauline

# Web server and SMTP fake for `npm start`.
: "${PORT:=3000}"
: "${SMTP_PORT:=2525}"

# Ports for `npm test`, kept apart so tests can run while `npm start` serves.
: "${TAULINE_TEST_PORT:=3100}"
: "${TAULINE_TEST_SMTP_PORT:=2526}"

# Demo credentials seeded by db/seed.ts: invented, for the local demo only.
: "${TAULINE_CI_TOKEN:=tauline-demo-ci-token}"
: "${TAULINE_DEMO_PASSWORD:=cormorant-demo}"

MAIL_FROM_DEFAULT="Tauline <tauline@fenwick-hydro.test>"
DEMO_USERS=(developer qa release admin)
DEMO_DOMAIN=fenwick-hydro.test

# V8 flags for the web server (added to any NODE_OPTIONS of the caller). A young
# generation of 64 MB semispaces instead of V8's 16 MB: one large answer (a
# build of 200 runs, 7,000 values, 2.3 MB of JSON) allocates tens of MB of
# short-lived rows and objects, and with the default each such request paid
# for several scavenges that copied its live objects into the old space.
: "${TAULINE_SERVER_NODE_OPTIONS:=--max-semi-space-size=64}"

# Seconds to wait for /api/health after `next start`.
: "${TAULINE_HEALTH_TIMEOUT:=120}"
