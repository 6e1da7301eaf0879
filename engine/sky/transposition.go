package sky

import "math"

// Surface is a flat receiving surface: a solar panel, or the window of a
// light sensor.
type Surface struct {
	// TiltDeg is the slope β from horizontal: 0 faces the sky, 90 is
	// vertical, up to 180 (facing the ground).
	TiltDeg float64
	// AzimuthDeg is the direction the surface faces, from north clockwise:
	// 180 faces south (the equator-facing choice in the northern
	// hemisphere), 0 north.
	AzimuthDeg float64
	// Albedo is the ground reflectance ρg seen by the surface, 0–1; 0.2 is
	// the usual default for grass and soil (common practice).
	Albedo float64
}

// POA is the irradiance on the plane of a Surface (plane of array), W/m²,
// by component.
type POA struct {
	BeamWm2       float64 // direct beam, DNI·cos θ
	SkyDiffuseWm2 float64 // diffuse from the sky dome
	GroundWm2     float64 // reflected from the ground
}

// TotalWm2 is the sum of the three components.
func (p POA) TotalWm2() float64 { return p.BeamWm2 + p.SkyDiffuseWm2 + p.GroundWm2 }

// AngleOfIncidenceDeg returns the angle θ between the Sun's rays and the
// normal of a surface tilted tiltDeg and facing surfaceAzimuthDeg, for a Sun
// at zenithDeg and sunAzimuthDeg (both azimuths from north clockwise, or
// both from south: only their difference counts):
//
//	cos θ = cos θz cos β + sin θz sin β cos(γs − γ)
//
// θ is in [0°, 180°]; above 90° the Sun is behind the surface.
//
// Reference: Duffie & Beckman, Solar Engineering of Thermal Processes,
// 4th ed. (2013), §1.6 (the form in zenith and azimuth angles, eq. 1.6.3 —
// number from memory).
func AngleOfIncidenceDeg(zenithDeg, sunAzimuthDeg, tiltDeg, surfaceAzimuthDeg float64) float64 {
	return math.Acos(cosIncidence(zenithDeg, sunAzimuthDeg, tiltDeg, surfaceAzimuthDeg)) * rad2deg
}

func cosIncidence(zenithDeg, sunAzimuthDeg, tiltDeg, surfaceAzimuthDeg float64) float64 {
	sz, cz := math.Sincos(zenithDeg * deg2rad)
	sb, cb := math.Sincos(tiltDeg * deg2rad)
	c := cz*cb + sz*sb*math.Cos((sunAzimuthDeg-surfaceAzimuthDeg)*deg2rad) // D&B §1.6
	return max(-1, min(1, c))
}

// Isotropic returns the plane-of-array irradiance with the isotropic-sky
// model of Liu & Jordan: beam on the plane, the sky as a uniform dome seen
// through the view factor (1 + cos β)/2, and the ground as a uniform diffuse
// reflector seen through (1 − cos β)/2:
//
//	POA = DNI·max(cos θ, 0) + DHI (1 + cos β)/2 + GHI ρg (1 − cos β)/2
//
// (D&B eq. 2.15.1 with the beam term written instantaneously, Ib·Rb =
// DNI·cos θ). zenithDeg is the Sun's zenith angle; with the Sun at or
// below the horizon the beam is 0. Negative irradiances count as 0.
//
// Reference: B. Y. H. Liu and R. C. Jordan, "The long-term average
// performance of flat-plate solar-energy collectors", Solar Energy 7(2),
// 53–74 (1963); Duffie & Beckman, 4th ed. (2013), eq. 2.15.1.
func (s Surface) Isotropic(irr Irradiance, zenithDeg, sunAzimuthDeg float64) POA {
	cb := math.Cos(s.TiltDeg * deg2rad)
	return POA{
		BeamWm2:       s.beam(irr, zenithDeg, sunAzimuthDeg),
		SkyDiffuseWm2: max(irr.DHIWm2, 0) * (1 + cb) / 2,            // D&B eq. 2.15.1, sky term
		GroundWm2:     max(irr.GHIWm2, 0) * s.Albedo * (1 - cb) / 2, // D&B eq. 2.15.1, ground term
	}
}

// MinCosZenithHayDavies floors cos θz in the Hay & Davies beam ratio Rb =
// cos θ / cos θz: cos 89° = 0.01745, so Rb stays finite at sunrise (common
// practice; pvlib's haydavies uses the same floor, from memory).
const MinCosZenithHayDavies = 0.01745

// HayDavies returns the plane-of-array irradiance with the Hay & Davies
// anisotropic sky: a share Ai = DNI/Gon of the diffuse (the anisotropy index)
// comes from the Sun's direction (circumsolar, projected like the beam with
// Rb = cos θ/cos θz), the rest from an isotropic dome:
//
//	sky diffuse = DHI [Ai Rb + (1 − Ai)(1 + cos β)/2]
//
// beam and ground as in Isotropic. normalWm2 is the extraterrestrial normal
// irradiance Gon (NormalWm2). With DNI = 0 it equals Isotropic; on a
// horizontal surface with GHI = DNI cos θz + DHI it returns GHI.
//
// Reference: J. E. Hay and J. A. Davies, "Calculation of the solar radiation
// incident on an inclined surface", in Proc. First Canadian Solar Radiation
// Data Workshop, J. E. Hay and T. K. Won (eds.), Ministry of Supply and
// Services Canada, 59–72 (1980); Duffie & Beckman, 4th ed. (2013), §2.16
// (Hay & Davies model; section number from memory).
func (s Surface) HayDavies(irr Irradiance, zenithDeg, sunAzimuthDeg, normalWm2 float64) POA {
	p := s.Isotropic(irr, zenithDeg, sunAzimuthDeg)
	ai := 0.0
	if normalWm2 > 0 {
		ai = max(0, min(1, max(irr.DNIWm2, 0)/normalWm2)) // anisotropy index
	}
	rb := 0.0
	if zenithDeg < 90 {
		rb = max(cosIncidence(zenithDeg, sunAzimuthDeg, s.TiltDeg, s.AzimuthDeg), 0) /
			max(math.Cos(zenithDeg*deg2rad), MinCosZenithHayDavies)
	}
	cb := math.Cos(s.TiltDeg * deg2rad)
	p.SkyDiffuseWm2 = max(irr.DHIWm2, 0) * (ai*rb + (1-ai)*(1+cb)/2) // Hay & Davies (1980)
	if math.IsNaN(normalWm2) || math.IsNaN(irr.DNIWm2) {
		p.SkyDiffuseWm2 = math.NaN()
	}
	return p
}

func (s Surface) beam(irr Irradiance, zenithDeg, sunAzimuthDeg float64) float64 {
	if math.IsNaN(zenithDeg) || math.IsNaN(irr.DNIWm2) {
		return math.NaN()
	}
	if zenithDeg >= 90 {
		return 0
	}
	return max(irr.DNIWm2, 0) * max(cosIncidence(zenithDeg, sunAzimuthDeg, s.TiltDeg, s.AzimuthDeg), 0)
}
