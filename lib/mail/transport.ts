import 'server-only';
import nodemailer, { type Transporter } from 'nodemailer';
import { getEnv } from '@/lib/env';

/** SMTP to the configured server (the local fake in development and tests). */
export function createMailTransport(): Transporter {
  const env = getEnv();
  return nodemailer.createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: false,
    ignoreTLS: env.SMTP_HOST === '127.0.0.1',
    connectionTimeout: 5000,
    greetingTimeout: 5000,
    socketTimeout: 10000,
  });
}
