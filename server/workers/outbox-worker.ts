import { config } from '../config';
import { createTransport } from '../mail/transport';
import { buildPendingSummaries } from '../services/delivery-service';
import { purgeExpired } from '../services/maintenance-service';
import { sendPendingEmails } from '../services/outbox-service';
import { queueOverdueReworkReminders } from '../services/reminder-service';
import { refitRiskModelIfDue } from '../services/risk-model-service';

// Runs in every instance; the leases keep them from building or sending the same row twice.
export function startOutboxWorker() {
  if (config.outbox.intervalMs <= 0) return () => undefined;
  const transport = createTransport();
  let running = false;
  // Reminders are due by the hour; looking once a minute is plenty (sending stays fast).
  let lastReminderCheck = 0;
  const tick = async () => {
    if (running) return;
    running = true;
    try {
      if (Date.now() - lastReminderCheck >= 60_000) {
        lastReminderCheck = Date.now();
        await queueOverdueReworkReminders();
        await purgeExpired();
        await refitRiskModelIfDue();
      }
      await buildPendingSummaries();
      await sendPendingEmails(transport);
    } catch (error) {
      console.error('outbox worker:', (error as Error).message);
    } finally {
      running = false;
    }
  };
  const timer = setInterval(() => void tick(), config.outbox.intervalMs);
  timer.unref();
  return () => clearInterval(timer);
}
