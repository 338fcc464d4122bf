// E-mail per recipient, paced: the first notification after a quiet spell goes out at once; any
// that follow within `quietMs` wait and leave together as one digest once `quietMs` passes with
// nothing new, or when `cap` are waiting, or `maxWaitMs` after the first one waited. So fifty
// comments in seconds make two e-mails, not fifty. The in-app notifications are all kept; what
// waits here is only mail, in memory (a stop sends what is waiting).
import type { NotificationKind, NotificationPayload } from '@/shared/api/notifications';
import type { Deps } from '../deps';
import type { OutgoingMail } from '../mail/mailer';
import { digestMail, notificationMail } from './mail';

export interface MailPacing {
  quietMs: number;
  maxWaitMs: number;
  cap: number;
}

export const defaultMailPacing = (): MailPacing => ({ quietMs: 2 * 60_000, maxWaitMs: 15 * 60_000, cap: 50 });

export interface Waiting {
  kind: NotificationKind;
  payload: NotificationPayload<NotificationKind>;
}

interface Box {
  to: string;
  lastSentAt: number;
  waiting: Waiting[];
  firstWaitAt: number;
  timer: NodeJS.Timeout | null;
}

export interface Pacer {
  mail(to: string, item: Waiting): Promise<void>;
  /** Sends every digest still waiting. */
  flush(): Promise<void>;
}

export function createPacer(deps: Deps): Pacer {
  const { quietMs, maxWaitMs, cap } = deps.config.mailPacing;
  const boxes = new Map<string, Box>();
  const base = () => deps.config.publicUrl;
  const send = async (mail: OutgoingMail) => {
    try {
      await deps.mailer.send(mail);
    } catch (err) {
      deps.log.error({ err }, 'notification mail failed'); // the in-app notifications stand
    }
  };
  const sendDigest = async (box: Box) => {
    if (box.timer) clearTimeout(box.timer);
    box.timer = null;
    const items = box.waiting.splice(0);
    if (!items.length) return;
    box.lastSentAt = Date.now();
    await send(items.length === 1 ? notificationMail(box.to, items[0].kind, items[0].payload, base()) : digestMail(box.to, items, base()));
  };
  return {
    async mail(to, item) {
      const now = Date.now();
      const box = boxes.get(to) ?? { to, lastSentAt: -Infinity, waiting: [], firstWaitAt: 0, timer: null };
      boxes.set(to, box);
      if (!box.waiting.length && now - box.lastSentAt >= quietMs) {
        box.lastSentAt = now;
        return send(notificationMail(to, item.kind, item.payload, base()));
      }
      if (!box.waiting.length) box.firstWaitAt = now;
      box.waiting.push(item);
      if (box.waiting.length >= cap) return sendDigest(box);
      if (box.timer) clearTimeout(box.timer);
      const wait = Math.min(quietMs, box.firstWaitAt + maxWaitMs - now);
      box.timer = setTimeout(() => void sendDigest(box), Math.max(0, wait));
      box.timer.unref();
    },
    async flush() {
      await Promise.all([...boxes.values()].map(sendDigest));
    },
  };
}
