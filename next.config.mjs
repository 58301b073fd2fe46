/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // Deployments are one Node process (app + mail sender), so no standalone bundle is needed.
};

export default nextConfig;
