import { useState } from 'react';
import IconButton from '@mui/material/IconButton';
import InputAdornment from '@mui/material/InputAdornment';
import TextField, { type TextFieldProps } from '@mui/material/TextField';
import Visibility from '@mui/icons-material/Visibility';
import VisibilityOff from '@mui/icons-material/VisibilityOff';

/** A password box with a show/hide button: typing with wet fingers goes wrong often. */
export function PasswordField(props: Omit<TextFieldProps, 'type'>) {
  const [shown, setShown] = useState(false);
  const toggle = (
    <InputAdornment position="end">
      <IconButton
        // Worded without "password", so the field stays the only thing labelled that.
        aria-label={shown ? 'Hide the typed characters' : 'Show the typed characters'}
        aria-pressed={shown}
        onClick={() => setShown((s) => !s)}
        edge="end"
      >
        {shown ? <VisibilityOff /> : <Visibility />}
      </IconButton>
    </InputAdornment>
  );
  return <TextField {...props} type={shown ? 'text' : 'password'} slotProps={{ input: { endAdornment: toggle } }} />;
}
