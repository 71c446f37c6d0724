// The app server alone, configured only by the environment (DATABASE_URL, PORT, DWELL_MODE, SMTP_URL,
// SMS_API_URL…): what a process manager runs in production, and what the crash-restart test starts and kills.
import { startServer } from '../main';
import { onShutdownSignal } from './shutdown';

// startServer logs "listening" with the URL as a JSON line (docs/operations.md, Logs).
const server = await startServer();
onShutdownSignal(() => server.close());
