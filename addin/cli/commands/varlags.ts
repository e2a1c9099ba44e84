/**
 * `mooring varlags`: the lag order of a VAR of two or more series by AIC, BIC, HQ and FPE
 * (chooseVarLags: every order on the same rows, a constant), with the criteria table.
 */
import { chooseVarLags } from '../../var/choose-var-lags';
import type { Command } from '../command';
import { wholeNumberValue } from '../option-values';
import { heading, labelled } from '../render/format';
import { renderSampleTerminal, sampleJson } from '../render/sample';
import { finiteOrNull } from '../render/test-json';
import { blockFromContext, seriesList } from '../series-input';
import { plainTable } from './plain-table';

/** The varlags command. */
export const varlagsCommand: Command = {
  name: 'varlags',
  summary: 'lag order of a VAR of several series by AIC, BIC, HQ and FPE',
  description: [
    'Fits a vector autoregression with a constant for every lag order from 0 to the largest, all on the same rows, ' +
      'and reports the order each criterion prefers (smallest value; a tie goes to fewer lags). BIC tends to pick fewer lags than AIC.',
    'Name two or more columns with --series A,B[,...]. The chosen order is a starting point for the lead-lag and Johansen tests.',
  ],
  usage: 'mooring varlags <file.csv> --series A,B[,...] [options]',
  options: [{ name: 'max-lags', value: 'N', help: 'largest order tried (default 12 (n/100)^(1/4), capped by the sample)' }],
  examples: ['mooring varlags prices.csv --series Gasoil,Diesel --log', 'mooring varlags prices.csv --series Gasoil,Diesel,Freight --max-lags 8 --json'],
  run(context) {
    const names = seriesList(context.common.series, 'varlags');
    const maxLags = wholeNumberValue('max-lags', context.args.values.get('max-lags'), 'lags');
    const block = blockFromContext(context, names);
    const labels = block.map((s) => s.label);
    const choice = chooseVarLags(block.map((s) => s.series.values), { maxLags, names: labels });

    const mark = (p: number, chosen: number): string => (p === chosen ? ' *' : '  ');
    const table = plainTable(
      ['lags', 'AIC', 'BIC', 'HQ', 'FPE'],
      choice.table.map((r) => [
        String(r.lags),
        `${r.aic.toFixed(4)}${mark(r.lags, choice.aic)}`,
        `${r.bic.toFixed(4)}${mark(r.lags, choice.bic)}`,
        `${r.hq.toFixed(4)}${mark(r.lags, choice.hq)}`,
        `${r.fpe.toExponential(4)}${mark(r.lags, choice.fpe)}`,
      ]),
    );
    const terminal = [
      heading(`VAR lag order of ${labels.join(', ')}`),
      '',
      labelled('Chosen by AIC', String(choice.aic)),
      labelled('Chosen by BIC', String(choice.bic)),
      labelled('Chosen by HQ', String(choice.hq)),
      labelled('Chosen by FPE', String(choice.fpe)),
      labelled('Largest order tried', `${choice.maxLags} (${choice.maxLagsRule})`),
      labelled('Rows per fit', `${choice.nobs} (the same for every order)`),
      '',
      ...table,
      '  * marks the smallest value of each criterion.',
      '',
      renderSampleTerminal({ ...block[0].sample, column: block.map((s) => s.series.name).join(', ') }),
    ];
    return {
      terminal: terminal.join('\n'),
      json: {
        series: labels,
        sample: sampleJson(block[0].sample),
        aic: choice.aic,
        bic: choice.bic,
        hq: choice.hq,
        fpe: choice.fpe,
        maxLags: choice.maxLags,
        maxLagsRule: choice.maxLagsRule,
        nobs: choice.nobs,
        trend: 'const',
        table: choice.table.map((r) => ({ lags: r.lags, aic: finiteOrNull(r.aic), bic: finiteOrNull(r.bic), hq: finiteOrNull(r.hq), fpe: finiteOrNull(r.fpe) })),
      },
    };
  },
};
