import { describe, expect, it } from 'vitest';
import { parseBoundaryFile } from '../../../server/services/imports/parse-boundaries';
import { BOUNDARY_IMPORT_MAX_BYTES } from '../../../shared/limits';
import { parseFixture, parseText } from './fixtures';

const ACCEPTED = 'Fieldshed reads field boundaries from GeoJSON (.geojson or .json), a zipped shapefile';

describe('bad boundary files', () => {
  it('answers 400 empty_file for an empty file', async () => {
    const result = await parseFixture('empty.geojson');
    expect(result).toMatchObject({ ok: false, status: 400, error: 'empty_file' });
    expect(!result.ok && result.message).toMatch(/^The file is empty \(0 bytes\)\. /);
  });

  it('answers 400 empty_file for a file of blank space', async () => {
    expect(await parseText(' \n\t ')).toMatchObject({ status: 400, error: 'empty_file' });
  });

  it('answers 415 for a PNG renamed .geojson, listing what is accepted', async () => {
    const result = await parseFixture('png-renamed.geojson');
    expect(result).toMatchObject({ ok: false, status: 415, error: 'unsupported_file_type' });
    expect(!result.ok && result.message).toMatch(/^This file is a PNG image\. /);
    expect(!result.ok && result.message).toContain(ACCEPTED);
  });

  it('answers 415 for a bare .shp, advising to zip it with its companions', async () => {
    const shp = Buffer.from([0x00, 0x00, 0x27, 0x0a, 0, 0, 0, 0]);
    const result = await parseBoundaryFile({ buffer: shp, originalName: 'fields.shp' });
    expect(result).toMatchObject({ status: 415, message: expect.stringContaining('zip it together with its .shx, .dbf and .prj') });
  });

  it('answers 415 for plain text with an unknown extension', async () => {
    expect(await parseText('name,area\nNorth Ridge,19', 'fields.csv')).toMatchObject({ status: 415, error: 'unsupported_file_type' });
  });

  it('answers 400 for malformed JSON, saying where it broke', async () => {
    const result = await parseFixture('malformed.geojson');
    expect(result).toMatchObject({ ok: false, status: 400, error: 'invalid_json' });
    expect(!result.ok && result.message).toMatch(/^The file is not valid JSON \(.*position \d+.*\)/);
  });

  it('answers 400 for a .geojson that does not start like JSON', async () => {
    expect(await parseText('hello fields', 'fields.geojson')).toMatchObject({
      status: 400, error: 'invalid_json', message: 'The file is not valid JSON: it should start with "{" but starts with "hello fields".',
    });
  });

  it('answers 400 for a truncated zip', async () => {
    const result = await parseFixture('truncated-shp.zip');
    expect(result).toMatchObject({ ok: false, status: 400, error: 'invalid_zip' });
    expect(!result.ok && result.message).toMatch(/^The zip file is damaged or incomplete/);
  });

  it('answers 400 for a .zip that is not a zip', async () => {
    const result = await parseText('just words', 'fields.zip');
    expect(result).toMatchObject({ status: 400, error: 'invalid_zip', message: expect.stringContaining('is not a zip archive') });
  });

  it('answers 413 for a file over 8 MB', async () => {
    const buffer = Buffer.alloc(BOUNDARY_IMPORT_MAX_BYTES + 1, 0x20);
    expect(await parseBoundaryFile({ buffer, originalName: 'big.geojson' })).toMatchObject({ ok: false, status: 413, error: 'file_too_large' });
  });

  it('answers 413 for more features than can be imported at once', async () => {
    const f = { type: 'Feature', properties: {}, geometry: null };
    const text = JSON.stringify({ type: 'FeatureCollection', features: Array.from({ length: 5001 }, () => f) });
    expect(await parseText(text)).toMatchObject({ status: 413, error: 'too_many_features' });
  });

  it('throws on misuse: no Buffer', async () => {
    await expect(parseBoundaryFile({ buffer: 'text' as unknown as Buffer, originalName: 'a.geojson' })).rejects.toThrow(
      'parseBoundaryFile: input.buffer must be a Buffer',
    );
  });
});
