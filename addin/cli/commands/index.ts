/**
 * The command table of `mooring`. A new command is one module in this folder exporting a
 * Command, plus one line here; order is the order of the help's list.
 */
import type { Command } from '../command';
import { adfCommand } from './adf';
import { kpssCommand } from './kpss';
import { orderCommand } from './order';
import { ppCommand } from './pp';

/** Every command, in help order. */
export const MOORING_COMMANDS: readonly Command[] = [adfCommand, kpssCommand, ppCommand, orderCommand];
