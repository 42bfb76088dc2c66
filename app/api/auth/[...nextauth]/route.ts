// GET|POST /api/auth/* — next-auth: sign in, sign out, session, CSRF token
import NextAuth from "next-auth";
import { authOptions } from "@/lib/auth/options";

const handler = NextAuth(authOptions);
export { handler as GET, handler as POST };
