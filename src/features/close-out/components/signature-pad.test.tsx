import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { SignaturePad } from './signature-pad';

// jsdom has no canvas: getContext and toDataURL are not implemented there. They are replaced with
// a recording 2D context and a fixed PNG data URL, so these tests check the pad's own behaviour
// (strokes from pointer events, the signed state, clearing), not real pixels.
const PNG = 'data:image/png;base64,iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==';
const strokes: Array<[string, number, number]> = [];

beforeEach(() => {
  strokes.length = 0;
  const ctx = {
    fillRect: vi.fn(),
    beginPath: vi.fn(),
    moveTo: vi.fn((x: number, y: number) => strokes.push(['moveTo', x, y])),
    lineTo: vi.fn((x: number, y: number) => strokes.push(['lineTo', x, y])),
    stroke: vi.fn(),
    drawImage: vi.fn(),
  };
  vi.spyOn(HTMLCanvasElement.prototype, 'getContext').mockReturnValue(ctx as unknown as CanvasRenderingContext2D);
  vi.spyOn(HTMLCanvasElement.prototype, 'toDataURL').mockReturnValue(PNG);
});

afterEach(() => {
  vi.restoreAllMocks();
});

function Harness({ onValue }: { onValue: (png: string) => void }) {
  const [value, setValue] = useState('');
  return (
    <SignaturePad
      label="Customer signature"
      value={value}
      onChange={(png) => {
        setValue(png);
        onValue(png);
      }}
    />
  );
}

describe('SignaturePad', () => {
  it('says how to sign, including that a keyboard cannot sign', () => {
    render(<Harness onValue={() => {}} />);
    const pad = screen.getByLabelText('Customer signature');
    expect(pad).toHaveAccessibleDescription(/Sign above the line with a finger or stylus\. The signature must be drawn: it cannot be typed/);
    // touch-action: none, so a finger stroke draws instead of scrolling the page.
    expect(pad).toHaveClass('touch-none');
    expect(screen.getByRole('status')).toHaveTextContent('Not signed yet');
    expect(screen.getByRole('button', { name: 'Clear signature' })).toBeDisabled();
  });

  it('draws a stroke from pointer events and marks the pad signed with a PNG', async () => {
    const values: string[] = [];
    const user = userEvent.setup();
    render(<Harness onValue={(png) => values.push(png)} />);
    const pad = screen.getByLabelText('Customer signature');

    await user.pointer([
      { keys: '[TouchA>]', target: pad, coords: { clientX: 20, clientY: 40 } },
      { pointerName: 'TouchA', target: pad, coords: { clientX: 80, clientY: 60 } },
      { pointerName: 'TouchA', target: pad, coords: { clientX: 140, clientY: 50 } },
      { keys: '[/TouchA]', target: pad },
    ]);

    expect(strokes).toContainEqual(['moveTo', 20, 40]);
    expect(strokes).toContainEqual(['lineTo', 140, 50]);
    expect(values).toEqual([PNG]);
    expect(screen.getByRole('status')).toHaveTextContent('Signed');
  });

  it('does not count a tap without movement as a signature', async () => {
    const values: string[] = [];
    const user = userEvent.setup();
    render(<Harness onValue={(png) => values.push(png)} />);

    await user.pointer({ keys: '[TouchA]', target: screen.getByLabelText('Customer signature'), coords: { clientX: 20, clientY: 40 } });

    expect(values).toEqual([]);
    expect(screen.getByRole('status')).toHaveTextContent('Not signed yet');
  });

  it('empties the signature when Clear is pressed', async () => {
    const values: string[] = [];
    const user = userEvent.setup();
    render(<Harness onValue={(png) => values.push(png)} />);
    const pad = screen.getByLabelText('Customer signature');
    await user.pointer([
      { keys: '[MouseLeft>]', target: pad, coords: { clientX: 10, clientY: 10 } },
      { target: pad, coords: { clientX: 60, clientY: 30 } },
      { keys: '[/MouseLeft]', target: pad },
    ]);
    expect(screen.getByRole('status')).toHaveTextContent('Signed');

    await user.click(screen.getByRole('button', { name: 'Clear signature' }));

    expect(values).toEqual([PNG, '']);
    expect(screen.getByRole('status')).toHaveTextContent('Not signed yet');
    expect(screen.getByRole('button', { name: 'Clear signature' })).toBeDisabled();
  });
});
