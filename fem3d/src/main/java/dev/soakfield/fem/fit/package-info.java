/**
 * Fits of measured diffusion data: weighing (uptake and desorption) of plate specimens on Crank's
 * plane-sheet solution, Arrhenius laws from diffusivities at several temperatures, and hydrogen
 * permeation transients (ISO 17081 / ASTM G148 evaluations beside a fit of the whole transient).
 * Estimates carry 95 % confidence intervals from the fit's covariance and Student's t.
 */
package dev.soakfield.fem.fit;
