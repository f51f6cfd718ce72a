import { onlineManager } from '@tanstack/react-query';
import { act, render, screen } from '@testing-library/react';

import { DownloadLink } from '@/components/ui/download-link';

afterEach(() => act(() => onlineManager.setOnline(true)));

describe('DownloadLink (files come from the server)', () => {
  it('online: a real download link to the file', () => {
    act(() => onlineManager.setOnline(true));
    render(<DownloadLink label="Download PDF" href="/api/sight-ins/4/sheet.pdf?to=60" testID="download-pdf" />);
    const link = screen.getByRole('link', { name: 'Download PDF' });
    expect(link.getAttribute('href')).toBe('/api/sight-ins/4/sheet.pdf?to=60');
    expect(link.hasAttribute('download')).toBe(true);
    expect(screen.queryByText('Needs a connection')).toBeNull();
  });

  it('offline: a disabled button with "Needs a connection" beside it, no link; back online it is a link again', () => {
    act(() => onlineManager.setOnline(false));
    render(<DownloadLink label="Download PDF" href="/api/sight-ins/4/sheet.pdf" testID="download-pdf" />);
    expect(screen.queryByRole('link')).toBeNull();
    const button = screen.getByRole('button', { name: 'Download PDF' });
    expect((button as HTMLButtonElement).disabled).toBe(true);
    expect(button.getAttribute('aria-describedby')).toBe('download-pdf-offline');
    expect(screen.getByText('Needs a connection').id).toBe('download-pdf-offline');

    act(() => onlineManager.setOnline(true));
    expect(screen.getByRole('link', { name: 'Download PDF' })).toBeTruthy();
    expect(screen.queryByText('Needs a connection')).toBeNull();
  });
});
