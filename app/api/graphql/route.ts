import { yoga } from "@/graphql/server";

export const dynamic = "force-dynamic";

export async function GET(request: Request) {
  return yoga.handleRequest(request, { request });
}

export async function POST(request: Request) {
  return yoga.handleRequest(request, { request });
}

export async function OPTIONS(request: Request) {
  return yoga.handleRequest(request, { request });
}
