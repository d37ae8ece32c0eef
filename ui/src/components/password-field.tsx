import { useState, type ComponentProps } from 'react';
import { Button } from '@blueprintjs/core';
import { EyeOffIcon, EyeOpenIcon } from '@blueprintjs/icons';
import { TextField } from './text-field';

/** A password input with a show/hide switch (typing a password with gloves on is error-prone). */
export function PasswordField(props: Omit<ComponentProps<typeof TextField>, 'type' | 'rightElement'>) {
  const [visible, setVisible] = useState(false);
  return (
    <TextField
      {...props}
      type={visible ? 'text' : 'password'}
      spellCheck={false}
      autoCapitalize="none"
      rightElement={
        <Button
          className="fw-password-toggle"
          variant="minimal"
          icon={visible ? <EyeOffIcon /> : <EyeOpenIcon />}
          aria-label={visible ? 'Hide password' : 'Show password'}
          aria-pressed={visible}
          onClick={() => setVisible((shown) => !shown)}
        />
      }
    />
  );
}
