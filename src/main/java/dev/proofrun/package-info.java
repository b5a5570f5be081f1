/**
 * Entry point of {@code proofrun.jar}: {@code Main} opens the wizard when started without arguments and runs
 * the command line otherwise. The packages below it form layers whose arrows point one way ({@code
 * LayeringTest}
 * and ArchUnit keep it so): {@code stats} (pure math) and {@code text} (messages, user errors) at the bottom;
 * the job in {@code control}, {@code capability}, {@code readings}, {@code design}, {@code schedule},
 * {@code plan}, {@code grade}; files out in {@code sheet} and {@code report}; people in through {@code cli}
 * and {@code app}. Only {@code app} imports JavaFX, and {@code design} does not import {@code grade}.
 */
package dev.proofrun;
