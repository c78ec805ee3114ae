import { MessageBar, MessageBarBody } from '@fluentui/react-components';

/** The form-wide error, announced when it appears. */
export function FormFailure({ message }: { message: string | null }) {
  return (
    <div role="alert" aria-live="assertive">
      {message ? (
        <MessageBar intent="error">
          <MessageBarBody>{message}</MessageBarBody>
        </MessageBar>
      ) : null}
    </div>
  );
}
