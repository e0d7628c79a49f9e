# shellcheck shell=bash
# The environment the app (lib/env.ts), db/migrate.ts, db/seed.ts and the
# tests read. export_app_env WEB_PORT SMTP_PORT DB_NAME MAIL_DIR

# NEXTAUTH_SECRET: generated once per checkout into .data/secret (git-ignored,
# never committed) unless the caller sets one.
ensure_nextauth_secret() {
  if [ -n "${NEXTAUTH_SECRET:-}" ]; then
    return 0
  fi
  local secret_file="$DATA_DIR/secret"
  if [ ! -s "$secret_file" ]; then
    (umask 077 && node -e "process.stdout.write(require('node:crypto').randomBytes(32).toString('base64'))" >"$secret_file")
  fi
  NEXTAUTH_SECRET="$(cat "$secret_file")"
}

export_app_env() {
  local web_port="$1" smtp_port="$2" db_name="$3" mail_dir="$4"
  ensure_nextauth_secret
  export NEXTAUTH_SECRET
  export DATABASE_URL
  DATABASE_URL="$(database_url "$db_name")"
  export PORT="$web_port"
  export APP_URL="http://127.0.0.1:$web_port"
  export NEXTAUTH_URL="$APP_URL"
  export SMTP_HOST=127.0.0.1
  export SMTP_PORT="$smtp_port"
  export SMTP_SECURE=false
  export MAIL_FROM="${MAIL_FROM:-$MAIL_FROM_DEFAULT}"
  export MAIL_DIR="$mail_dir"
  export TAULINE_CI_TOKEN TAULINE_DEMO_PASSWORD
  # Next.js and our scripts print less noise and send nothing home.
  export NEXT_TELEMETRY_DISABLED=1
}
