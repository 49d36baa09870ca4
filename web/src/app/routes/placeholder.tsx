import { Typography } from '@mui/material';
import { PageHeader } from '../../components/ui/states';

/** A screen that a later change fills in. */
export function Placeholder({ title, text }: { title: string; text: string }) {
  return (
    <>
      <PageHeader title={title} />
      <Typography color="text.secondary">{text}</Typography>
    </>
  );
}
