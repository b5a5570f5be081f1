/**
 * Goal: per characteristic the required index, confidence and what the process is expected to do — from a mean
 * and sigma ({@code design.ProcessFacts}) or a pilot file ({@code readings.ReadingsCsv} and {@code
 * capability.CapabilityAnalysis}). The view only binds and draws; the view-model holds the state, validates,
 * and is the only caller of the core.
 */
package dev.proofrun.app.goal;
