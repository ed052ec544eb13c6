/**
 * The elements of the sheet below its top (sections 2–9, and the trace dialog): the strata,
 * lab tests, support, the results views, the uncertainty study and the report. They are not in the first
 * load: `<lamina-app>` imports this module once the first results are painted, and renders
 * those sections when it has loaded (`completeSheet`). Elements rendered before their
 * definition arrives (the trace dialog) upgrade in place.
 */
import '../inputs/strata-editor';
import '../inputs/lab-tests-panel';
import '../inputs/support-form';
import '../results/index';
import '../uncertainty/uncertainty-section';
