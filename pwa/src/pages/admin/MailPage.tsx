import { useMail } from '../../api/admin';
import { QueryState } from '../../components/desk/QueryState';
import { Screen } from '../../components/Screen';
import { when } from '../../components/time';

/**
 * What the plant server has mailed, as kept by its own local mail server: lets an
 * administrator check that supervisors were told about a flagged lot.
 */
export function MailPage() {
  const mail = useMail();
  return (
    <Screen title="Mail outbox">
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
