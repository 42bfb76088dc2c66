/** @type {import('next').NextConfig} */
const nextConfig = {
  // pg and the SMTP/mail packages use Node built-ins; keep them out of the bundle.
  serverExternalPackages: ["pg", "nodemailer", "smtp-server", "mailparser", "highs"],
  poweredByHeader: false,
  typedRoutes: false,
};

export default nextConfig;
