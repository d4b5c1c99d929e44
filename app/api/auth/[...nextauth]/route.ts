// Auth.js's own endpoints (sign-in callback, session, CSRF token, sign-out).
import { handlers } from '@/auth';

export const { GET, POST } = handlers;
