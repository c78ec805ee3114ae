import { Inject, Injectable, Logger, type OnModuleDestroy, type OnModuleInit } from '@nestjs/common';
import nodemailer, { type Transporter } from 'nodemailer';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { startLocalSmtpServer } from './local-smtp-server.js';
import { GROUP_HEADER, KIND_HEADER, type MailMessage } from './mail-message.js';
import { OutboxService } from './outbox.service.js';

/**
 * Sends mail with nodemailer over SMTP. With `SMTP_URL` set it delivers there; without it Homeground
 * starts its own SMTP server on loopback and keeps each message in the outbox that organisers and
 * admins read in the app, so development, tests and demos send real mail that never leaves the machine.
 */
@Injectable()
export class MailService implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger('MailService');
  private transport: Transporter;
  private closeLocalServer: (() => Promise<void>) | null = null;

  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    private readonly outbox: OutboxService,
  ) {}

  /** True when mail stays in the local outbox instead of going to a real mail server. */
  get isLocal(): boolean {
    return this.config.smtpUrl === null;
  }

  async onModuleInit(): Promise<void> {
    // Pooled: a connection is kept open and reused, so a burst of confirmations does not pay an SMTP
    // connection and greeting per message (about 10 ms a message instead of 110 ms on loopback).
    if (this.config.smtpUrl) {
      this.transport = nodemailer.createTransport({ url: this.config.smtpUrl, pool: true });
      return;
    }
    if (this.config.isProduction) {
      this.logger.warn('SMTP_URL is not set: e-mail is kept in the in-app outbox and not delivered.');
    }
    const local = await startLocalSmtpServer((mail) => this.outbox.keep(mail));
    this.closeLocalServer = local.close;
    // Loopback only, so no TLS: the message never leaves this machine.
    this.transport = nodemailer.createTransport({
      host: '127.0.0.1',
      port: local.port,
      secure: false,
      ignoreTLS: true,
      pool: true,
    });
  }

  async onModuleDestroy(): Promise<void> {
    this.transport?.close();
    await this.closeLocalServer?.();
  }

  /**
   * Forgets what the local outbox kept of a group's messages of one kind family (e.g. a plant share's
   * confirmations once takers' names and e-mails are past their retention). Real SMTP keeps nothing here.
   */
  forgetOutbox(groupId: string, kindPrefix: string): Promise<void> {
    return this.outbox.forget(groupId, kindPrefix);
  }

  /** Sends one message and resolves once the server has accepted it. */
  async send(message: MailMessage): Promise<{ messageId: string }> {
    const headers: Record<string, string> = { [KIND_HEADER]: message.kind };
    if (message.groupId) headers[GROUP_HEADER] = message.groupId;
    const info = await this.transport.sendMail({
      from: this.config.mailFrom,
      to: message.to,
      subject: message.subject,
      text: message.text,
      html: message.html,
      headers,
    });
    return { messageId: info.messageId };
  }
}
