export interface CaughtMessage {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  receivedAt: string;
}

/** Messages kept in memory, newest first, up to a cap: a development inbox, not an archive. */
export class MailStore {
  private messages: CaughtMessage[] = [];
  private nextId = 1;

  constructor(private readonly cap = 500) {}

  add(message: Omit<CaughtMessage, 'id'>): CaughtMessage {
    const stored = { ...message, id: this.nextId++ };
    this.messages.unshift(stored);
    if (this.messages.length > this.cap) this.messages.length = this.cap;
    return stored;
  }

  list(): CaughtMessage[] {
    return this.messages;
  }

  get(id: number): CaughtMessage | undefined {
    return this.messages.find((m) => m.id === id);
  }
}
