/**
 * Statics of rigid foundation elements: how loads on an element reach what supports it (pile-group
 * reactions under a rigid cap; contact pressure under a footing next). Pure functions over plain
 * numbers that leave a trace; imports nothing of the project but the formula library's trace types.
 */
package dev.countercheck.statics;
