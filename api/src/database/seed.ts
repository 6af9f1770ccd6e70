import type { INestApplicationContext } from '@nestjs/common';
import { DataSource, In } from 'typeorm';
import { User } from '../users/entities/user.entity.js';

export const DEMO_PASSWORD = 'demo-password-1';
export const DEMO_EMAILS = ['inspector', 'supervisor', 'quality', 'admin'].map(
  (r) => `${r}@demo.test`,
);

/** One line for the console while any demo account can still sign in. */
export async function demoAccountsWarning(
  app: INestApplicationContext,
): Promise<string | undefined> {
  const active = await app
    .get(DataSource)
    .getRepository(User)
    .countBy({ email: In(DEMO_EMAILS), active: true });
  if (active === 0) return undefined;
  return `Warning: ${active} demo account(s) (…@demo.test, password ${DEMO_PASSWORD}) can sign in; deactivate them before real use`;
}
