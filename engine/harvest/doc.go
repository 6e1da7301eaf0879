// Package harvest turns light into the power a harvester delivers to the
// node's charger: a small solar panel outdoors (plane-of-array irradiance,
// incidence-angle loss, cell temperature by the NOCT model, temperature
// coefficient, soiling and snow), or an indoor-light cell under the site's
// lights (illuminance through the light source's luminous efficacy). It also
// says when the horizon profile blocks the sun.
//
// Inputs are W/m², lux, °C and degrees; outputs are W after the charger's
// efficiency. Irradiance below zero counts as zero; results are never
// negative and never NaN for finite inputs.
package harvest
