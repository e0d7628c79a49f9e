# shellcheck shell=bash
# What `npm start` prints once the app answers.

# The README's first curl example, so the printed line and the documented one
# cannot drift apart; a plain query that any schema answers otherwise.
print_curl_example() {
  local readme="$TAULINE_ROOT/README.md" example=""
  if [ -f "$readme" ]; then
    example="$(awk '/^```/ { if (inside) { if (found) exit; inside = 0 } else inside = 1; next }
      inside && /curl/ { found = 1 } inside && found { print }' "$readme")"
  fi
  if [ -z "$example" ]; then
    example="curl -sS $APP_URL/api/graphql \\
  -H 'Authorization: Bearer $TAULINE_CI_TOKEN' -H 'Content-Type: application/json' \\
  -d '{\"query\":\"{ __typename }\"}'"
  fi
  # The README shows the default port; print the URL this server really has.
  printf '%s\n' "$example" | sed "s#http://127.0.0.1:3000#$APP_URL#; s/^/  /"
}

print_welcome() {
  local user
  echo
  say "Tauline is running at $APP_URL"
  echo "  Demo users (password: $TAULINE_DEMO_PASSWORD):"
  for user in "${DEMO_USERS[@]}"; do
    echo "    $user@$DEMO_DOMAIN"
  done
  echo "  Demo CI token: $TAULINE_CI_TOKEN"
  echo "  Mail sent by the app lands in $MAIL_DIR (SMTP fake on 127.0.0.1:$SMTP_PORT)"
  echo "  Logs: $RUN_DIR/web.log, $RUN_DIR/smtp.log, $PGDATA_TAULINE/server.log"
  echo "  Submit results from CI like this:"
  print_curl_example
  echo "  Stop everything with: npm stop"
}
