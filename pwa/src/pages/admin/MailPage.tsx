import { IonButton } from '@ionic/react';
import { useForm } from 'react-hook-form';
import { useMail, useMailSettings, useSendTestMail } from '../../api/admin';
import type { MailSettings } from '../../api/types';
import { QueryState } from '../../components/desk/QueryState';
import { Facts } from '../../components/Facts';
import { Field } from '../../components/Field';
import { Screen } from '../../components/Screen';
import { when } from '../../components/time';
import { describeSyncError } from '../../offline/sync';

function SettingsCard({ settings }: { settings: MailSettings }) {
  const { sent, waiting, failed } = settings.queue;
  const facts: [string, string][] = [
    [
      'Mail server',
      settings.transport === 'local'
        ? `local, run by the plant server (${settings.server}); set SMTP_URL to send through the plant's own`
        : settings.server,
    ],
    ['Sent as', settings.from],
    [
      'Told of a flagged lot',
      settings.flaggedLotRecipients.join(', ') || 'nobody: there is no active supervisor',
    ],
    ['Messages', `${sent} sent, ${waiting} waiting, ${failed} given up after repeated failures`],
  ];
  return <Facts facts={facts} testId="mail-settings" />;
}

function TestMailForm() {
  const send = useSendTestMail();
  const { register, handleSubmit, formState } = useForm<{ to: string }>();
  const submit = handleSubmit((fields) => send.mutateAsync(fields.to.trim()));
  return (
    <form onSubmit={(event) => void submit(event).catch(() => undefined)} noValidate>
      <div className="form-grid">
        <Field label="Send a test message to" error={formState.errors.to?.message}>
          <input
            type="email"
            autoComplete="email"
            {...register('to', { required: 'An e-mail address.' })}
          />
        </Field>
      </div>
      {send.error && <p className="field-error">{describeSyncError(send.error)}</p>}
      {send.isSuccess && <p role="status">Sent. It shows below when it has gone through.</p>}
      <div className="form-actions">
        <IonButton type="submit" disabled={formState.isSubmitting}>
          Send test message
        </IonButton>
      </div>
    </form>
  );
}

/**
 * Where the plant server's mail goes, a test message, and what it has mailed as kept by its own
 * local mail server: lets an administrator check that supervisors are told of a flagged lot.
 */
export function MailPage() {
  const mail = useMail();
  const settings = useMailSettings();
  return (
    <Screen title="Mail">
      <h2 className="section-title">Settings</h2>
      <QueryState query={settings} what="the mail settings">
        {(loaded) => <SettingsCard settings={loaded} />}
      </QueryState>
      <TestMailForm />
      <h2 className="section-title">Kept by the local mail server</h2>
      <QueryState query={mail} what="the mail">
        {(messages) =>
          messages.length === 0 ? (
            <p className="empty-note">No mail sent yet.</p>
          ) : (
            <div className="mail-list" data-testid="mail-list">
              {messages.map((message) => (
                <details key={message.id} className="mail-item">
                  <summary>
                    <strong>{message.subject}</strong>
                    <span>
                      to {message.to} · {when(message.date)}
                    </span>
                  </summary>
                  <pre>{message.text}</pre>
                </details>
              ))}
            </div>
          )
        }
      </QueryState>
    </Screen>
  );
}
