/**
 * Part: the part, the people and the characteristics table (cells checked on every keystroke on a copy of the
 * row, committed on Enter or on leaving the cell). The view only binds and draws; the view-model holds the
 * state, validates, and is the only caller of the core.
 */
package dev.proofrun.app.part;
