import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { FluentProvider } from '@fluentui/react-components';
import { homegroundTheme } from '../../theme/index.js';
import { QueryState, type QueryLike } from './query-state.js';

const base = { isPending: false, isError: false, error: null, data: undefined, refetch: () => undefined };
const show = (query: QueryLike<string[]>, keepDataOnError = false) =>
  render(
    <FluentProvider theme={homegroundTheme}>
      <QueryState
        query={query}
        loading="Loading the groups"
        error="The list of groups did not load."
        isEmpty={(d) => d.length === 0}
        empty="No growing groups have joined yet."
        keepDataOnError={keepDataOnError}
      >
        {(groups) => (
          <ul>
            {groups.map((g) => (
              <li key={g}>{g}</li>
            ))}
          </ul>
        )}
      </QueryState>
    </FluentProvider>,
  );

describe('QueryState', () => {
  it('says what is loading', () => {
    show({ ...base, isPending: true });
    expect(screen.getByText('Loading the groups')).toBeInTheDocument();
  });

  it('says what failed, with the reason and a retry that refetches', async () => {
    const refetch = vi.fn();
    show({ ...base, isError: true, error: new Error('The server did not answer.'), refetch });
    expect(screen.getByRole('alert')).toHaveTextContent('The list of groups did not load.The server did not answer.');
    await userEvent.click(screen.getByRole('button', { name: 'Try again' }));
    expect(refetch).toHaveBeenCalledOnce();
  });

  it('says so plainly when the answer is empty, and shows the content otherwise', () => {
    const { unmount } = show({ ...base, data: [] });
    expect(screen.getByText('No growing groups have joined yet.')).toBeInTheDocument();
    unmount();
    show({ ...base, data: ['Larkfield Commons Growers'] });
    expect(screen.getByRole('listitem')).toHaveTextContent('Larkfield Commons Growers');
  });

  it('replaces stale content with the error unless asked to keep it', () => {
    const failed = { ...base, isError: true, error: new Error('offline'), data: ['Larkfield Commons Growers'] };
    const { unmount } = show(failed);
    expect(screen.getByRole('alert')).toBeInTheDocument();
    unmount();
    show(failed, true);
    expect(screen.queryByRole('alert')).toBeNull();
    expect(screen.getByRole('listitem')).toBeInTheDocument();
  });
});
