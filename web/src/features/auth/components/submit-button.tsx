import { Button, Spinner } from '@fluentui/react-components';

/** The form's one primary action: disabled with a spinner while the request runs. */
export function SubmitButton({
  isPending,
  label,
  pendingLabel,
}: {
  isPending: boolean;
  label: string;
  pendingLabel: string;
}) {
  return (
    <Button
      type="submit"
      appearance="primary"
      disabled={isPending}
      icon={isPending ? <Spinner size="tiny" /> : undefined}
    >
      {isPending ? pendingLabel : label}
    </Button>
  );
}
