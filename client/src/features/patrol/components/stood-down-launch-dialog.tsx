import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';

interface Props {
  open: boolean;
  boatName: string;
  saving: boolean;
  onCancel: () => void;
  onLaunch: () => void;
}

/** Asked before a stood-down boat's launch is logged: the phone records, the patrol captain decides. */
export function StoodDownLaunchDialog({ open, boatName, saving, onCancel, onLaunch }: Props) {
  return (
    <Dialog open={open} onClose={onCancel} aria-labelledby="launch-stood-down">
      <DialogTitle id="launch-stood-down">{boatName} is stood down</DialogTitle>
      <DialogContent>
        <DialogContentText>
          A stood-down boat is not launched until a competent person returns it to service. Log a launch only if the
          patrol captain has made that call, for example a rescue with no other boat.
        </DialogContentText>
      </DialogContent>
      <DialogActions>
        <Button size="large" onClick={onCancel}>Do not launch</Button>
        <Button size="large" color="error" onClick={onLaunch} disabled={saving}>Log the launch</Button>
      </DialogActions>
    </Dialog>
  );
}
