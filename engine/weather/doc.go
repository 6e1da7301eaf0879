// Package weather reads typical-year weather files: TMY3 CSV (Wilcox &
// Marion, Users Manual for TMY3 Data Sets, NREL/TP-581-43156, 2008) and
// EnergyPlus weather (EPW; EnergyPlus "Auxiliary Programs", the weather file
// format). Both give hourly, hour-ending values in local standard time (no
// daylight saving): the row stamped 1:00 covers 0:00–1:00.
//
// A Series keeps what the engine uses — global horizontal, direct normal and
// diffuse horizontal irradiance, extraterrestrial horizontal irradiance, dry
// bulb temperature, pressure, albedo and snow depth where the file has them —
// with missing values as NaN. Files whose rows are shorter than an hour (the
// 1-minute measurement files in the TMY3 layout) read the same way.
//
// Malformed files return a *ParseError naming the file, line, column, the
// column's name, the bad value and what is allowed. Values outside physical
// bounds (temperature −90 to 70 °C, irradiance 0 to 1500 W/m²) are errors too.
package weather
