import { act, fireEvent, screen, waitFor, within } from '@testing-library/react-native';
import { DocumentsTab } from '@/components/documents/documents-tab';
import { RepertoireTab } from '@/components/repertoire/repertoire-tab';
import { SetupTab } from '@/components/setup/setup-tab';
import type { DocumentRecord } from '@/shared/schemas/document';
import type { PieceRecord } from '@/shared/schemas/repertoire';
import type { SetupItem } from '@/shared/schemas/setup';
import { renderScreen } from './test-utils';

jest.mock('@/lib/auth-client', () => ({ authClient: { getSession: jest.fn() } }));
afterEach(() => jest.restoreAllMocks());

const CREATED = '2027-02-10T09:00:00.000Z';

const piece: PieceRecord = {
  id: 'pc-7',
  title: 'Quay Sonatina',
  composer: 'Orla Pennick',
  tier: 'moderate',
  passages: [],
  onProgramme: true,
  createdAt: CREATED,
  clearance: null,
};
const setupItem: SetupItem = { id: 'st-3', kind: 'chin_rest', label: 'Lower chin rest', instructions: '', active: true, createdAt: CREATED };
const document: DocumentRecord = {
  id: 'doc-2',
  title: 'Hand clinic letter',
  fileName: 'letter.pdf',
  mimeType: 'application/pdf',
  sizeBytes: 20_480,
  visibility: 'private',
  createdAt: CREATED,
};

interface Collection {
  path: string;
  items: { id: string }[];
  /** The status the DELETE answers with (204 removes the item). */
  deleteStatus?: number;
}

/** A small stateful server: the list is answered from `items`, and a 204 DELETE takes the item out of it. */
function serve(collection: Collection) {
  const deletes: string[] = [];
  jest.spyOn(global, 'fetch').mockImplementation(async (input, init) => {
    const url = new URL(typeof input === 'string' ? input : input instanceof URL ? input.href : input.url);
    const method = init?.method ?? 'GET';
    if (method === 'GET' && url.pathname === collection.path) return new Response(JSON.stringify(collection.items), { status: 200 });
    if (method === 'DELETE' && url.pathname.startsWith(`${collection.path}/`)) {
      const id = decodeURIComponent(url.pathname.slice(collection.path.length + 1));
      deletes.push(id);
      const status = collection.deleteStatus ?? 204;
      if (status !== 204) return new Response(JSON.stringify({ error: { code: 'server_error', message: 'The server could not remove it just now.' } }), { status });
      collection.items = collection.items.filter((item) => item.id !== id);
      return new Response(null, { status: 204 });
    }
    return new Response(JSON.stringify({ error: { code: 'not_found', message: 'No route.' } }), { status: 404 });
  });
  return deletes;
}

const cases = [
  {
    what: 'a piece',
    render: () => <RepertoireTab id="m-1" />,
    collection: () => ({ path: '/api/musicians/m-1/pieces', items: [piece] }),
    button: `piece-delete-${piece.id}`,
    name: 'Quay Sonatina',
    question: 'Remove ‘Quay Sonatina’ from the repertoire?',
    id: piece.id,
  },
  {
    what: 'a setup item',
    render: () => <SetupTab id="m-1" />,
    collection: () => ({ path: '/api/musicians/m-1/setup', items: [setupItem] }),
    button: `setup-delete-${setupItem.id}`,
    name: 'Lower chin rest',
    question: 'Remove ‘Lower chin rest’ from the setup?',
    id: setupItem.id,
  },
  {
    what: 'a document',
    render: () => <DocumentsTab id="m-1" />,
    collection: () => ({ path: '/api/musicians/m-1/documents', items: [document] }),
    button: `document-delete-${document.id}`,
    name: 'Hand clinic letter',
    question: 'Delete ‘Hand clinic letter’ from this record?',
    id: document.id,
  },
];

describe.each(cases)('deleting $what on the record', ({ render, collection, button, name, question, id }) => {
  async function openConfirm() {
    renderScreen(render());
    // renderRouter turns on fake timers; fetch and the query client need real ones.
    jest.useRealTimers();
    await screen.findByText(name);
    fireEvent.press(screen.getByTestId(button));
    return screen.getByTestId(`${button}-confirm`);
  }

  it('does not delete and keeps the item when the confirmation is cancelled', async () => {
    const deletes = serve(collection());
    const confirm = await openConfirm();
    expect(within(confirm).getByText(question)).toBeTruthy();
    expect(confirm.props.role).toBe('alertdialog');
    expect(screen.queryByTestId(button)).toBeNull();

    fireEvent.press(screen.getByTestId(`${button}-no`));
    expect(screen.queryByTestId(`${button}-confirm`)).toBeNull();
    expect(screen.getByTestId(button)).toBeTruthy();
    // Give any stray request time to be made before saying none was.
    await act(() => new Promise((resolve) => setTimeout(resolve, 50)));
    expect(deletes).toEqual([]);
    expect(screen.getByText(name)).toBeTruthy();
  });

  it('deletes the item when the confirmation is accepted', async () => {
    const deletes = serve(collection());
    await openConfirm();
    fireEvent.press(screen.getByTestId(`${button}-yes`));
    // The delete, then the list read again: two round trips, slower than waitFor's one second on a busy machine.
    await waitFor(() => expect(screen.queryByText(name)).toBeNull(), { timeout: 4000 });
    expect(deletes).toEqual([id]);
  });

  it('keeps the item and says why inside the confirmation when the server refuses the delete', async () => {
    const deletes = serve({ ...collection(), deleteStatus: 500 });
    await openConfirm();
    fireEvent.press(screen.getByTestId(`${button}-yes`));
    expect(await screen.findByTestId(`${button}-error`)).toHaveTextContent(/Not removed: The server could not remove it just now\./);
    expect(deletes).toEqual([id]);
    expect(screen.getByText(name)).toBeTruthy();
  });
});
