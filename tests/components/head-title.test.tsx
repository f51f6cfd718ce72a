/**
 * The web build's stand-in for expo-router's document-head library
 * (components/shell/router-stand-ins/head-title.js) sets the browser tab's
 * title the way the library does: the Head mounted last wins, and when it
 * goes the one before it shows again.
 */
import { render } from '@testing-library/react';

// Plain CommonJS, loaded as Metro's web bundle loads it.
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { Helmet, HelmetProvider } = require('../../components/shell/router-stand-ins/head-title.js') as {
  Helmet: (props: { children?: React.ReactNode }) => null;
  HelmetProvider: (props: { children?: React.ReactNode }) => React.ReactNode;
};

function Titled({ name, children }: { name: string; children?: React.ReactNode }) {
  return (
    <>
      <Helmet>
        <title>{name} · Pinwright</title>
      </Helmet>
      {children}
    </>
  );
}

beforeEach(() => {
  document.title = 'before';
});

it('shows the innermost title, a parent’s Head being mounted first', () => {
  render(
    <HelmetProvider>
      <Titled name="Bows">
        <Titled name="Bench" />
      </Titled>
    </HelmetProvider>,
  );
  expect(document.title).toBe('Bench · Pinwright');
});

it('shows the previous title again when the newest Head goes, and follows a changed title', () => {
  const screens = (inner: string | null) => <Titled name="Bench">{inner ? <Titled name={inner} /> : null}</Titled>;
  const { rerender } = render(screens('Sight-in'));
  expect(document.title).toBe('Sight-in · Pinwright');
  rerender(screens('Tape'));
  expect(document.title).toBe('Tape · Pinwright');
  rerender(screens(null));
  expect(document.title).toBe('Bench · Pinwright');
  rerender(screens('Tape'));
  expect(document.title).toBe('Tape · Pinwright');
});

it('refuses anything but a title, rather than drop it silently', () => {
  const quiet = jest.spyOn(console, 'error').mockImplementation(() => {});
  expect(() =>
    render(
      <Helmet>
        <meta name="description" content="x" />
      </Helmet>,
    ),
  ).toThrow(/only a <title>/);
  quiet.mockRestore();
});
