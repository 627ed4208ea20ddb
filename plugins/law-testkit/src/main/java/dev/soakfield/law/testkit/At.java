package dev.soakfield.law.testkit;

import dev.soakfield.law.api.LawPoint;

/**
 * A point where a test evaluates a law.
 *
 * @param concentration end-of-step mobile concentration
 * @param temperature end-of-step temperature, K
 * @param time end-of-step time, s
 * @param dt step length, s
 */
public record At(double concentration, double temperature, double time, double dt)
    implements LawPoint {}
