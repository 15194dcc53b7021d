/** @type {import('next').NextConfig} */
const nextConfig = {
  serverExternalPackages: ["pg", "smtp-server", "nodemailer", "mailparser"],
  poweredByHeader: false,
  // Several local stacks (src/ops/dev-stack.sh) can run side by side, each
  // with its own build folder.
  distDir: process.env.NEXT_DIST_DIR || ".next",
};

export default nextConfig;
