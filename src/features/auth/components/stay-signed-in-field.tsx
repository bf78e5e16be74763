import { forwardRef, type InputHTMLAttributes } from 'react';
import { UNKEPT_SESSION_IDLE_HOURS } from '@shared/schemas/auth.schema';
import { CheckField } from '@/components/ui/field';

/**
 * "Keep me signed in on this device", ticked by default, for the forms that sign someone in on the device in their
 * hands (sign-in, joining by an invitation). Unticked, the session ends with the browser (a shared computer).
 */
export const StaySignedInField = forwardRef<HTMLInputElement, InputHTMLAttributes<HTMLInputElement>>(function StaySignedInField(props, ref) {
  return (
    <CheckField
      ref={ref}
      label="Keep me signed in on this device"
      hint={`Untick on a shared or kitchen computer: you are signed out when the browser closes (or after ${UNKEPT_SESSION_IDLE_HOURS} hours unused), and your plans and lists are not kept on it for use offline.`}
      {...props}
    />
  );
});
