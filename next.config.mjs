/** @type {import('next').NextConfig} */
const nextConfig = {
  serverExternalPackages: ["pg", "smtp-server", "nodemailer"],
  poweredByHeader: false,
  typedRoutes: false,
};

export default nextConfig;
