package dev.countercheck.actions;

/** ψ0, ψ1, ψ2 of one kind of variable action (EN 1990 Table A1.1 or the National Annex). */
public record Psi(double psi0, double psi1, double psi2) {
}
