import { IonButton } from '@ionic/react';
import { useForm } from 'react-hook-form';
import {
  useChangeRole,
  useCreateUser,
  useDeactivateUser,
  useUsers,
  type NewUser,
} from '../../api/admin';
import type { Role, User } from '../../api/types';
import { QueryState } from '../../components/desk/QueryState';
import { useSession } from '../../auth/session';
import { Field } from '../../components/Field';
import { Screen } from '../../components/Screen';
import { describeSyncError } from '../../offline/sync';

const ROLES: Role[] = ['inspector', 'supervisor', 'quality', 'admin'];

function NewPersonForm() {
  const create = useCreateUser();
  const { register, handleSubmit, reset, formState } = useForm<NewUser>({
    defaultValues: { role: 'inspector' },
  });
  const submit = handleSubmit(async (fields) => {
    await create.mutateAsync({ ...fields, email: fields.email.trim(), name: fields.name.trim() });
    reset();
  });
  const { errors } = formState;
  return (
    <form onSubmit={(event) => void submit(event).catch(() => undefined)} noValidate>
      <div className="form-grid">
        <Field label="Name" error={errors.name?.message}>
          <input {...register('name', { required: 'Their name, as colleagues know it.' })} />
        </Field>
        <Field label="Email" error={errors.email?.message}>
          <input type="email" {...register('email', { required: 'An email to sign in with.' })} />
        </Field>
        <Field label="Role">
          <select {...register('role')}>
            {ROLES.map((role) => (
              <option key={role}>{role}</option>
            ))}
          </select>
        </Field>
        <Field label="First password" error={errors.password?.message}>
          <input
            type="password"
            autoComplete="new-password"
            {...register('password', {
              minLength: { value: 10, message: 'At least 10 characters.' },
              required: 'At least 10 characters.',
            })}
          />
        </Field>
      </div>
      {create.error && <p className="field-error">{describeSyncError(create.error)}</p>}
      <div className="form-actions">
        <IonButton type="submit" disabled={formState.isSubmitting}>
          Add person
        </IonButton>
      </div>
    </form>
  );
}

function PersonRow({ user, self }: { user: User; self: boolean }) {
  const changeRole = useChangeRole();
  const deactivate = useDeactivateUser();
  const problem = changeRole.error ?? deactivate.error;
  return (
    <tr>
      <td>{user.name}</td>
      <td>{user.email}</td>
      <td>
        <select
          className="table-select"
          value={user.role}
          disabled={!user.active || self}
          aria-label={`Role of ${user.name}`}
          onChange={(event) => changeRole.mutate({ id: user.id, role: event.target.value as Role })}
        >
          {ROLES.map((role) => (
            <option key={role}>{role}</option>
          ))}
        </select>
      </td>
      <td>
        {self ? (
          'you'
        ) : user.active ? (
          <IonButton fill="outline" color="danger" onClick={() => deactivate.mutate(user.id)}>
            Deactivate
          </IonButton>
        ) : (
          'deactivated'
        )}
        {problem && <div className="field-error">{describeSyncError(problem)}</div>}
      </td>
    </tr>
  );
}

/** Who may sign in and what they may do; deactivating ends all their sign-ins at once. */
export function PeoplePage() {
  const users = useUsers();
  const { person } = useSession();
  return (
    <Screen title="People">
      <QueryState query={users} what="the people">
        {(list) => (
          <table className="data-table" data-testid="people-table">
            <thead>
              <tr>
                <th>Name</th>
                <th>Email</th>
                <th>Role</th>
                <th>Access</th>
              </tr>
            </thead>
            <tbody>
              {list.map((user) => (
                <PersonRow key={user.id} user={user} self={user.id === person?.userId} />
              ))}
            </tbody>
          </table>
        )}
      </QueryState>
      <h2 className="section-title">Add a person</h2>
      <NewPersonForm />
    </Screen>
  );
}
