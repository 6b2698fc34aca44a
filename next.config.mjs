/** @type {import('next').NextConfig} */
const nextConfig = {
  // Tests build into their own folder so they never disturb the demo's build.
  distDir: process.env.KETBOOK_DIST_DIR || '.next',
  // Sequelize's dialect loader uses dynamic requires that bundlers cannot follow.
  serverExternalPackages: ['sequelize', 'mariadb', 'smtp-server', 'nodemailer', 'bcryptjs'],
  // Without this, `next dev` logs server-action arguments, passwords included.
  logging: { serverFunctions: false },
  poweredByHeader: false,
  experimental: {
    // Saved CI vectors travel through route handlers; the handler enforces its own limit.
    serverActions: { bodySizeLimit: '2mb' },
  },
};
export default nextConfig;
