/**
 * The window's frame: {@code ShellView} (step rail, the current page, what is missing, the status line,
 * Back/Next, keys: Alt+←/→ or Ctrl+Page Up/Down, Ctrl+1…7; the rail is not in the Tab order) over {@code
 * ShellViewModel} (which step, what may be reached, autosave, and the close question with {@code CloseChoice}
 * — Save, Keep as a draft, Stay; the draft is written before any answer is acted on). Each step is a {@code
 * StepView} over a {@code StepViewModel}.
 *
 * A page is put in the scene on its first showing and then stays, hidden while another step shows (showing it
 * again makes no skins and applies no CSS again). While nobody types or clicks, the page after the current one
 * is built ahead, hidden, so that its first showing only changes what is visible. Each step puts the focus in
 * its first field, asked again once the scroll pane has put the page in the scene.
 *
 * Shared by the steps: {@code FontScale} (sizes set in code, in em, following the system font), {@code Tables}
 * (read-only tables with rows of one height, as tall as their rows), {@code IndexTip} (the one source of the
 * formula and meaning of Cp, Cpu, Cpl, Cpk, Pp, Ppu, Ppl, Ppk, Cpm and of a lower bound) and {@code
 * IndexTooltips} (keeps a label's tooltip in step with its text: every index named in it gets its tip).
 */
package dev.proofrun.app.shell;
