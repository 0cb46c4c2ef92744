/**
 * The design-aids worker: the same solver worker under its own script name, so the design aids
 * (window, chooser, today's setting) run on their own thread beside the main solve.
 */
import './solver.worker.ts';
