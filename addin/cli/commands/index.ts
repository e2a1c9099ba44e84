/**
 * The command table of `mooring`. A new command is one module in this folder exporting a
 * Command, plus one line here; order is the order of the help's list.
 */
import type { Command } from '../command';
import { adfCommand } from './adf';
import { ardlCommand } from './ardl';
import { breaksCommand } from './breaks';
import { dfglsCommand } from './dfgls';
import { ecmCommand } from './ecm';
import { egCommand } from './eg';
import { forecastCommand } from './forecast';
import { grangerCommand } from './granger';
import { hedgeCommand } from './hedge';
import { johansenCommand } from './johansen';
import { kalmanCommand } from './kalman';
import { kpssCommand } from './kpss';
import { mergeCommand } from './merge';
import { ngperronCommand } from './ngperron';
import { orderCommand } from './order';
import { poCommand } from './po';
import { ppCommand } from './pp';
import { reportCommand } from './report';
import { rollingCommand } from './rolling';
import { screenCommand } from './screen';
import { spreadCommand } from './spread';
import { varlagsCommand } from './varlags';

/** Every command, in help order. */
export const MOORING_COMMANDS: readonly Command[] = [
  adfCommand, kpssCommand, ppCommand, dfglsCommand, ngperronCommand, orderCommand,
  egCommand, poCommand, johansenCommand, ardlCommand, hedgeCommand, kalmanCommand, ecmCommand, spreadCommand, forecastCommand,
  reportCommand,
  varlagsCommand, grangerCommand,
  screenCommand, mergeCommand, rollingCommand, breaksCommand,
];
