/**
 * Open: recent plans, opening a plan file (read on a worker, the latest request wins), a new plan, the demo
 * plan on a first start. The view only binds and draws; the view-model holds the state, validates, and is the
 * only caller of the core.
 */
package dev.proofrun.app.start;
