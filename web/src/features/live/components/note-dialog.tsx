import {
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  TextField,
} from '@mui/material';
import { useState } from 'react';

export function NoteDialog(props: {
  open: boolean;
  onNote: (text: string) => void;
  onClose: () => void;
}) {
  const [text, setText] = useState('');
  const close = () => {
    setText('');
    props.onClose();
  };
  return (
    <Dialog open={props.open} onClose={close} fullWidth maxWidth="sm" aria-labelledby="note-title">
      <DialogTitle id="note-title">Note</DialogTitle>
      <DialogContent>
        <TextField
          autoFocus
          fullWidth
          multiline
          minRows={3}
          label="Note text"
          value={text}
          onChange={(e) => setText(e.target.value.slice(0, 2000))}
          sx={{ mt: 1 }}
        />
      </DialogContent>
      <DialogActions>
        <Button onClick={close} sx={{ minHeight: 56 }}>
          Cancel
        </Button>
        <Button
          variant="contained"
          disabled={text.trim() === ''}
          onClick={() => {
            props.onNote(text.trim());
            close();
          }}
          sx={{ minHeight: 56, minWidth: 120 }}
        >
          Save note
        </Button>
      </DialogActions>
    </Dialog>
  );
}
