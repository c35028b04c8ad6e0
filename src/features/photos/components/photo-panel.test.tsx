import { configure, render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createAppQueryClient } from '@/app/create-app-query-client';
import { AppProvider } from '@/app/provider';
import { apiError, mockApi } from '@/testing/mock-api';
import type { AttachmentDto } from '@shared/schemas/attachment';
import { PhotoPanel } from './photo-panel';

// Screens here wait on mocked requests; a busy two-core machine can take over a second.
configure({ asyncUtilTimeout: 5000 });

afterEach(() => {
  vi.unstubAllGlobals();
});

const VISIT_ID = 7;
const PATH = `/api/visits/${VISIT_ID}/attachments`;

function storedPhoto(id: string, stepId: string | null, caption: string | null): AttachmentDto {
  return {
    id,
    visitId: VISIT_ID,
    kind: 'photo',
    stepId,
    caption,
    mimeType: 'image/jpeg',
    bytes: 1234,
    width: 800,
    height: 600,
    url: `${PATH}/${id}/file`,
    thumbUrl: `${PATH}/${id}/thumb`,
    createdBy: 1,
    createdAt: '2026-03-02T10:00:00.000Z',
  };
}

type UploadReply = { status: number; body?: unknown } | 'network down';

/**
 * A photo endpoint that remembers what was stored; each POST takes the next reply in `replies`
 * (a stored photo when none is left). The multipart body is read from the fetch call itself.
 */
function photosApi(replies: UploadReply[] = []) {
  const stored: AttachmentDto[] = [];
  const forms: FormData[] = [];
  const api = mockApi({
    [`GET ${PATH}`]: (call) => ({
      status: 200,
      body: { items: stored.filter((p) => !call.query.get('stepId') || p.stepId === call.query.get('stepId')) },
    }),
    [`POST ${PATH}`]: () => {
      const form = api.fetchMock.mock.lastCall?.[1]?.body as FormData;
      forms.push(form);
      const reply = replies.shift();
      if (reply === 'network down') throw new TypeError('Failed to fetch');
      if (reply) return reply;
      const photo = storedPhoto(String(form.get('id')), (form.get('stepId') as string | null) ?? null, (form.get('caption') as string | null) ?? null);
      stored.push(photo);
      return { status: 201, body: { items: [photo] } };
    },
  });
  return { api, stored, forms };
}

function renderPanel(stepId: string | null = 'connector-coupling') {
  const user = userEvent.setup();
  render(
    <AppProvider queryClient={createAppQueryClient()}>
      <PhotoPanel visitId={VISIT_ID} stepId={stepId} prompt="Photograph the connector as found." />
    </AppProvider>,
  );
  return user;
}

const jpeg = (name: string) => new File(['jpeg bytes'], name, { type: 'image/jpeg' });
const cameraInput = () => screen.getByLabelText('Take photo', { selector: 'input' });

describe('PhotoPanel', () => {
  it('shows the prompt and a large Take photo button wired to the rear camera', async () => {
    photosApi();
    renderPanel();

    expect(screen.getByText('Photograph the connector as found.')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Take photo' })).toHaveAccessibleDescription('Photograph the connector as found.');
    const input = cameraInput();
    expect(input).toHaveAttribute('accept', 'image/*');
    expect(input).toHaveAttribute('capture', 'environment');
    expect(input).toHaveAttribute('multiple');
    expect(await screen.findByText('No photos yet.')).toBeInTheDocument();
  });

  it('uploads a chosen photo with its step and caption, then shows its thumbnail and caption', async () => {
    const { forms } = photosApi();
    const user = renderPanel();
    await screen.findByText('No photos yet.');

    await user.type(screen.getByRole('textbox', { name: /Caption for the next photo/ }), 'Pin 3 pushed back');
    await user.upload(cameraInput(), jpeg('connector.jpg'));

    const thumbnail = await screen.findByRole('img', { name: 'Pin 3 pushed back' });
    expect(thumbnail.getAttribute('src')).toMatch(/\/thumb$/);
    const upload = within(screen.getByRole('list', { name: 'Photo uploads' })).getByRole('listitem');
    expect(upload).toHaveTextContent('Saved');
    expect(upload).toHaveTextContent('connector.jpg');
    expect(within(screen.getByRole('list', { name: 'Stored photos' })).getByText('Pin 3 pushed back')).toBeInTheDocument();
    expect(forms).toHaveLength(1);
    expect(forms[0]!.get('stepId')).toBe('connector-coupling');
    expect(forms[0]!.get('caption')).toBe('Pin 3 pushed back');
    expect((forms[0]!.get('photos') as File).name).toBe('connector.jpg');
    expect(forms[0]!.get('id')).toMatch(/^[0-9a-f-]{36}$/);
    // The caption was for that photo only.
    expect(screen.getByRole('textbox', { name: /Caption for the next photo/ })).toHaveValue('');
  });

  it('sends several photos chosen at once, each with its own id', async () => {
    const { forms } = photosApi();
    const user = renderPanel();
    await screen.findByText('No photos yet.');

    await user.upload(cameraInput(), [jpeg('before.jpg'), jpeg('after.jpg')]);

    expect(await screen.findByRole('img', { name: 'Photo 2' })).toBeInTheDocument();
    expect(screen.getByRole('img', { name: 'Photo 1' })).toBeInTheDocument();
    expect(new Set(forms.map((f) => f.get('id'))).size).toBe(2);
  });

  it("shows the server's message when the file is not an image, with what to do next", async () => {
    const message = 'The photo (notes.jpg) is not a picture: its contents are not JPEG, PNG or WebP, whatever its name says.';
    photosApi([apiError(415, 'not_an_image', message)]);
    const user = renderPanel();
    await screen.findByText('No photos yet.');

    await user.upload(cameraInput(), jpeg('notes.jpg'));

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent(message);
    expect(alert).toHaveTextContent('Remove it from the list and take or choose it again.');
    expect(within(alert).queryByRole('button', { name: 'Retry' })).not.toBeInTheDocument();
    expect(screen.getByText('Not saved')).toBeInTheDocument();
  });

  it('offers Retry after a network failure and the retry sends the same id', async () => {
    const { forms } = photosApi(['network down']);
    const user = renderPanel();
    await screen.findByText('No photos yet.');

    await user.type(screen.getByRole('textbox', { name: /Caption for the next photo/ }), 'Terminal block');
    await user.upload(cameraInput(), jpeg('terminals.jpg'));
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('the network dropped');

    await user.click(within(alert).getByRole('button', { name: 'Retry' }));

    expect(await screen.findByRole('img', { name: 'Terminal block' })).toBeInTheDocument();
    expect(forms).toHaveLength(2);
    expect(forms[1]!.get('id')).toBe(forms[0]!.get('id'));
    expect(forms[1]!.get('caption')).toBe('Terminal block');
    await waitFor(() => expect(screen.queryByRole('alert')).not.toBeInTheDocument());
  });

  it('deletes a photo only after the technician confirms', async () => {
    const stored = [storedPhoto('3b0c4a8e-0000-4000-8000-000000000001', null, 'Control as left')];
    const api = mockApi({
      [`GET ${PATH}`]: () => ({ status: 200, body: { items: stored } }),
      [`DELETE ${PATH}/3b0c4a8e-0000-4000-8000-000000000001`]: () => {
        stored.length = 0;
        return { status: 204 };
      },
    });
    const user = renderPanel(null);

    await user.click(await screen.findByRole('button', { name: 'Delete Control as left' }));
    expect(screen.getByRole('img', { name: 'Control as left' })).toBeInTheDocument();
    // Nothing is deleted by the first press: the technician must confirm.
    expect(api.callsTo('DELETE', `${PATH}/3b0c4a8e-0000-4000-8000-000000000001`)).toHaveLength(0);
    await user.click(screen.getByRole('button', { name: 'Yes, delete' }));

    expect(await screen.findByText('No photos yet.')).toBeInTheDocument();
  });

  it('shows photos read-only when the visit is not open', async () => {
    const { stored } = photosApi();
    stored.push(storedPhoto('3b0c4a8e-0000-4000-8000-000000000002', null, 'Sensor nameplate'));
    render(
      <AppProvider queryClient={createAppQueryClient()}>
        <PhotoPanel visitId={VISIT_ID} stepId={null} disabled />
      </AppProvider>,
    );

    expect(await screen.findByRole('img', { name: 'Sensor nameplate' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Take photo' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Delete/ })).not.toBeInTheDocument();
  });

  it('lists only general photos when the panel is for the whole visit', async () => {
    const { stored } = photosApi();
    stored.push(storedPhoto('3b0c4a8e-0000-4000-8000-000000000003', 'connector-coupling', 'Step photo'));
    stored.push(storedPhoto('3b0c4a8e-0000-4000-8000-000000000004', null, 'Whole press'));
    renderPanel(null);

    expect(await screen.findByRole('img', { name: 'Whole press' })).toBeInTheDocument();
    expect(screen.queryByRole('img', { name: 'Step photo' })).not.toBeInTheDocument();
  });
});
