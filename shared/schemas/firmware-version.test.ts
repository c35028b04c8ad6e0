import { FIRMWARE_UNREADABLE, firmwareVersionText, isFirmwareVersionAnswer } from './firmware-version';

// The grammar is our own decision (see DEVELOPERS.md, "Firmware versions"), not a published format.
describe('isFirmwareVersionAnswer', () => {
  it('takes dotted versions, a short letter prefix and a short suffix', () => {
    for (const v of ['2.14', '3.1.0', 'v2.0.7', 'V4', '2.14b', '2.0.7-rc1', 'R12.3', '1.2.3.4.5.6']) expect(isFirmwareVersionAnswer(v), v).toBe(true);
  });

  it('takes the explicit "cannot be read" choice', () => {
    expect(isFirmwareVersionAnswer(FIRMWARE_UNREADABLE)).toBe(true);
    expect(firmwareVersionText(FIRMWARE_UNREADABLE)).toBe('Cannot read the version');
    expect(firmwareVersionText('2.14')).toBe('2.14');
  });

  it('refuses markup, words, empty text, spaces and over-long versions', () => {
    for (const v of ['<script>alert("fw")</script>', 'latest', '', ' 2.1', '2..1', '.2', '2.', 'v', '1.2.3.4.5.6.7', '1234567.1', 'abcd1.0', '2.0.7-rc1-extra', `1.${'1'.repeat(41)}`]) {
      expect(isFirmwareVersionAnswer(v), v).toBe(false);
    }
  });
});
