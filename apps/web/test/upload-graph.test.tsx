import type { UploadResult } from '@cairn/schema';
import { cleanup, fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { setCsrfToken } from '../src/api/csrf';
import { GraphUpload } from '../src/components/upload/GraphUpload';
import { json, on, renderWithClient, stubFetch } from './support/render-page';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  setCsrfToken(null);
});

const RESULT: UploadResult = {
  graph: {
    id: '44444444-4444-4444-8444-444444444444',
    name: 'cabinet-joints.txt',
    format: 'edge-list',
    sha256: 'b'.repeat(64),
    vertexCount: 12,
    edgeCount: 17,
    sizeBytes: 120,
    owner: { id: '11111111-1111-4111-8111-111111111111', login: 'ada' },
    createdAt: '2025-03-01T10:00:00.000Z',
  },
  created: true,
  warnings: [
    { kind: 'self-loop', line: 4, column: 1, message: 'self-loop 3 3 dropped' },
    { kind: 'duplicate-edge', line: 7, column: 1, message: 'edge 1 2 repeats line 2; dropped' },
  ],
  warningCount: 5,
};

const file = (text: string, name = 'cabinet-joints.txt') => new File([text], name, { type: 'text/plain' });

describe('GraphUpload', () => {
  it('shows the line and column of a parse error answer', async () => {
    stubFetch(
      on('POST', '/api/v1/graphs', () =>
        json(400, {
          error: {
            code: 'parse_error',
            message: 'cabinet-joints.txt:3:5: found "x", expected a vertex id',
            details: { line: 3, column: 5, expected: 'a vertex id', found: '"x"', format: 'edge-list' },
          },
        }),
      ),
    );
    const onUploaded = vi.fn();
    renderWithClient(<GraphUpload onUploaded={onUploaded} />);
    fireEvent.change(screen.getByLabelText('Choose a graph file'), { target: { files: [file('0 1\n1 2\n2 3x\n')] } });
    const error = await screen.findByTestId('upload-error');
    expect(error.textContent).toContain('line 3, column 5');
    expect(error.textContent).toContain('found "x", expected a vertex id');
    expect(onUploaded).not.toHaveBeenCalled();
  });

  it('sends the file as multipart field "file" with the CSRF header, and lists the warnings', async () => {
    setCsrfToken('csrf-token-2');
    const sent = stubFetch(on('POST', '/api/v1/graphs', () => json(201, RESULT)));
    const onUploaded = vi.fn();
    renderWithClient(<GraphUpload onUploaded={onUploaded} />);
    fireEvent.change(screen.getByLabelText('File format'), { target: { value: 'edge-list' } });
    fireEvent.change(screen.getByLabelText('Choose a graph file'), { target: { files: [file('0 1\n')] } });
    await waitFor(() => expect(onUploaded).toHaveBeenCalledWith(RESULT));
    const form = sent[0]!.body as FormData;
    expect(form).toBeInstanceOf(FormData);
    expect((form.get('file') as File).name).toBe('cabinet-joints.txt');
    expect(form.get('format')).toBe('edge-list');
    expect(sent[0]!.headers['x-csrf-token']).toBe('csrf-token-2');
    // The browser sets the multipart boundary itself: no content type may be forced.
    expect(sent[0]!.headers['content-type']).toBeUndefined();
    const warnings = screen.getByTestId('upload-warnings');
    expect(warnings.textContent).toContain('line 4, column 1: self-loop 3 3 dropped');
    expect(warnings.textContent).toContain('… and 3 more');
  });

  it('takes a dropped file', async () => {
    const sent = stubFetch(on('POST', '/api/v1/graphs', () => json(200, { ...RESULT, created: false, warnings: [], warningCount: 0 })));
    renderWithClient(<GraphUpload onUploaded={() => undefined} />);
    fireEvent.drop(screen.getByTestId('drop-zone'), { dataTransfer: { files: [file('1 2\n', 'panel.el')] } });
    expect((await screen.findByTestId('upload-result')).textContent).toContain('you uploaded these bytes before');
    expect(((sent[0]!.body as FormData).get('file') as File).name).toBe('panel.el');
  });

  it('says when the file is too large', async () => {
    stubFetch(on('POST', '/api/v1/graphs', () => json(413, { error: { code: 'file_too_large', message: 'the file is larger than the upload limit of 8 MB', details: { field: 'file' } } })));
    renderWithClient(<GraphUpload onUploaded={() => undefined} />);
    fireEvent.change(screen.getByLabelText('Choose a graph file'), { target: { files: [file('0 1\n')] } });
    const error = await screen.findByTestId('upload-error');
    expect(error.textContent).toContain('The file is too large.');
    expect(error.textContent).toContain('upload limit of 8 MB');
  });
});
