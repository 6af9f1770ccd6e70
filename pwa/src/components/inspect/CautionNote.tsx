import type { SpecBody } from '../../api/types';
import './caution.css';

/** Parts checked under load (a test deflection) carry load in service: mounts, pads, bumpers. */
export function isLoadBearing(body: SpecBody): boolean {
  return body.testDeflection > 0;
}

/** DESIGN §7: what the numbers on a load-bearing part are, and what they are not. */
export function CautionNote({ body }: { body: SpecBody }) {
  if (!isLoadBearing(body)) return null;
  return (
    <aside className="caution" data-testid="caution">
      <strong>This part carries load.</strong> The expected load and the windows shown are estimates
      worked out from the compound's fitted constants and the part's shape. The customer's drawing
      and the standards it names decide acceptance. A safety-critical part also needs the sign-off
      of a qualified engineer.
    </aside>
  );
}
