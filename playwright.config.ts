import { defineConfig, devices } from '@playwright/test';
import { execFileSync } from 'node:child_process';
import path from 'node:path';

// Workers inherit the environment, so the port chosen here once is the one every worker uses.
process.env.E2E_PORT ??= execFileSync('node', ['scripts/free-port.mjs']).toString().trim();
const port = process.env.E2E_PORT;
// The fake SMTP server's port, chosen the same way; the review desk's journey reads the mail it keeps.
process.env.E2E_SMTP_PORT ??= execFileSync('node', ['scripts/free-port.mjs']).toString().trim();
const baseURL = `http://127.0.0.1:${port}`;
const dataDir = path.join(process.cwd(), 'data', 'e2e');

const chromium = {
  executablePath: '/usr/bin/chromium',
  args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
};

export default defineConfig({
  testDir: 'tests/e2e',
  outputDir: 'test-results',
  fullyParallel: false,
  workers: 1,
  retries: 0,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: [['list'], ['html', { open: 'never', outputFolder: 'playwright-report' }]],
  use: {
    baseURL,
    launchOptions: chromium,
    screenshot: 'on',
    trace: 'retain-on-failure',
    viewport: { width: 1366, height: 900 },
  },
  projects: [{ name: 'chromium', use: { ...devices['Desktop Chrome'], viewport: { width: 1366, height: 900 }, launchOptions: chromium } }],
  webServer: {
    command: 'bash scripts/e2e-server.sh',
    url: `${baseURL}/sign-in`,
    timeout: 900_000,
    reuseExistingServer: false,
    stdout: 'pipe',
    env: {
      E2E_PORT: port,
      DATABASE_FILE: path.join(dataDir, 'e2e.db'),
      UPLOAD_DIR: path.join(dataDir, 'uploads'),
      FAKE_SMTP_PORT: process.env.E2E_SMTP_PORT,
      MAIL_DIR: path.join(dataDir, 'mail'),
      NEXTAUTH_URL: baseURL,
      NEXTAUTH_SECRET: 'e2e-secret-not-for-production',
    },
  },
});
