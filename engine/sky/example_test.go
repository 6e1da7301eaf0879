package sky_test

import (
	"fmt"

	"nodelife/engine/sky"
)

// A south-facing panel tilted 30° with the Sun due south at 30° from the
// zenith: GHI 800 W/m² of which 200 W/m² diffuse, grass in front.
func ExampleSurface_Isotropic() {
	const zenithDeg, sunAzimuthDeg = 30.0, 180.0
	irr := sky.Irradiance{GHIWm2: 800, DHIWm2: 200}
	irr.DNIWm2 = sky.DNIWm2(irr.GHIWm2, irr.DHIWm2, zenithDeg)

	panel := sky.Surface{TiltDeg: 30, AzimuthDeg: 180, Albedo: 0.2}
	poa := panel.Isotropic(irr, zenithDeg, sunAzimuthDeg)
	fmt.Printf("DNI %.2f W/m²\n", irr.DNIWm2)
	fmt.Printf("beam %.2f + sky %.2f + ground %.2f = %.2f W/m²\n",
		poa.BeamWm2, poa.SkyDiffuseWm2, poa.GroundWm2, poa.TotalWm2())
	fmt.Printf("outdoors ≈ %.0f klx\n", sky.IlluminanceLx(irr.GHIWm2, sky.DaylightLmPerW)/1000)
	fmt.Printf("500 lx of white LED light ≈ %.2f W/m²\n", sky.IrradianceFromLuxWm2(500, sky.IndoorWhiteLightLmPerW))
	// Output:
	// DNI 692.82 W/m²
	// beam 692.82 + sky 186.60 + ground 10.72 = 890.14 W/m²
	// outdoors ≈ 98 klx
	// 500 lx of white LED light ≈ 1.67 W/m²
}
