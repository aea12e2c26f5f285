import type { NextConfig } from 'next';

const nextConfig: NextConfig = {
  poweredByHeader: false,
  // `npm run typecheck` is its own step of npm test; the build does not run tsc a second time.
  typescript: { ignoreBuildErrors: true },
  // forbidden() renders app/forbidden.tsx with a real 403 status.
  experimental: { authInterrupts: true },
  // argon2 ships a native binary; keep it out of the server bundle.
  serverExternalPackages: ['@node-rs/argon2'],
};

export default nextConfig;
