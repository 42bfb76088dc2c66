/** @type {import('next').NextConfig} */
const nextConfig = {
  // pg and the SMTP/mail packages use Node built-ins; keep them out of the bundle.
  serverExternalPackages: ["pg", "nodemailer", "smtp-server", "mailparser", "highs", "pdfjs-dist"],
  poweredByHeader: false,
  // Tests build into their own folder so a running demo keeps its build.
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  typedRoutes: false,
};

export default nextConfig;
