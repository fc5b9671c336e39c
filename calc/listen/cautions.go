package listen

import "fmt"

// NearFullScaleDB is the sample peak (dBFS) from which a recording counts
// as near full scale. Common practice (a recording engineer's headroom of
// about 1 dB), no published source.
const NearFullScaleDB = -1.0

// CautionLoud is shown when a recording clipped or came near full scale. A
// recording cannot give the sound pressure level: digital full scale
// depends on the microphone, the phone and its gain (often automatic), so
// dB SPL needs a calibrated sound level meter. The "raise your voice to be
// heard about 2 m away" rule for noise that needs action is the UK Health
// and Safety Executive's (HSE, Noise at work, leaflet INDG362, from
// memory).
const CautionLoud = "The recording reached full scale. That may mean the sound at the phone was very loud, or only that the recording gain was high: a phone recording cannot tell the sound level in dB SPL without a calibrated microphone. A singing tube can be loud enough to harm hearing. If you have to raise your voice to be heard by someone about 2 m away, or your ears ring or feel dull afterwards, it is too loud: wear ear plugs or ear muffs, keep away from the open end, and measure the level with a sound level meter."

// CautionNoSPL is shown with every result: the level in dBFS is not a
// sound level.
const CautionNoSPL = "Levels here are in dBFS, relative to the recording's full scale, not dB SPL: they say nothing about how loud the tube is for your ears."

// clipWarning says what clipping does to the measurement.
func clipWarning(runs, samples int) string {
	return fmt.Sprintf("The recording clipped (%d flat tops, %d samples at full scale): levels and harmonics are wrong and the frequency may be off. Hold the phone farther from the tube or lower the gain, and record again.", runs, samples)
}
