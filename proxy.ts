import { withAuth } from "next-auth/middleware";

// Optimistic redirect only: a visitor without a session token is sent to the
// sign-in page. Every server action and GraphQL resolver checks the session and
// role again; this is not the guard, just the signpost.
export default withAuth({
  pages: { signIn: "/sign-in" },
});

export const config = {
  // Everything but sign-in, the set-password links (the link is the proof), the auth and
  // GraphQL endpoints (they answer 401 themselves), health, and static files (the app icon too,
  // which the signed-out pages show).
  matcher: ["/((?!sign-in|invite/|api/auth|api/graphql|api/health|_next/static|_next/image|favicon.ico|icon.svg).*)"],
};
