import { BadRequestError } from './errors';
import { MAX_TEMPERATURES, temperatures } from './temperatures';

const names = { list: 'T', tMin: 'Tmin', tMax: 'Tmax', tStep: 'Tstep' };

describe('temperature lists and grids', () => {
  it('reads a list, a grid (Tmax included when the steps land on it), or defaults to 298.15 K', () => {
    expect(temperatures({ list: ['298.15', ' 500', '1000'] }, names)).toEqual([298.15, 500, 1000]);
    expect(temperatures({ tMin: '298.15', tMax: '298.45', tStep: '0.1' }, names)).toEqual([298.15, 298.25, 298.35, 298.45]);
    expect(temperatures({ tMin: 300, tMax: 1000, tStep: 300 }, names)).toEqual([300, 600, 900]);
    expect(temperatures({}, names)).toEqual([298.15]);
  });

  it('names the parameter and position of what is wrong', () => {
    const fail = (input: Parameters<typeof temperatures>[0]) => {
      try {
        temperatures(input, names);
      } catch (error) {
        expect(error).toBeInstanceOf(BadRequestError);
        return error as BadRequestError;
      }
      throw new Error('expected a BadRequestError');
    };
    expect(fail({ list: ['300', 'x'] }).details).toEqual({ parameter: 'T', index: 1 });
    expect(fail({ list: ['0'] }).message).toContain('above 0');
    expect(fail({ list: [] }).message).toContain('at least one');
    expect(fail({ list: Array(MAX_TEMPERATURES + 1).fill('300') }).message).toContain(`at most ${MAX_TEMPERATURES}`);
    expect(fail({ tMin: '500', tMax: '300', tStep: '1' }).message).toContain('must not exceed');
    expect(fail({ tMin: '300', tMax: '500' }).details).toEqual({ parameter: 'Tstep' });
    expect(fail({ list: ['300'], tMin: '300' }).message).toContain('not both');
  });
});
