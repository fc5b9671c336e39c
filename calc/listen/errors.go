package listen

import "errors"

// The problems a recording can have. Errors returned by ReadWAV, ReadWAVFile
// and Analyze wrap exactly one of these, so a front end tells them apart with
// errors.Is and shows the error's own message, which names the detail (the
// encoding found, the length, the limit).
var (
	// ErrNotWAV: the bytes are not a RIFF/WAVE file (wrong signature), or
	// its structure is broken (no fmt chunk, a chunk that runs past the end
	// before any audio).
	ErrNotWAV = errors.New("not a WAV recording")
	// ErrUnsupported: a WAV file in an encoding this reader does not decode
	// (compressed, an odd sample size, more than two channels, a sample
	// rate outside MinSampleRate–MaxSampleRate).
	ErrUnsupported = errors.New("unsupported WAV encoding")
	// ErrEmpty: no samples at all, or too few to analyse.
	ErrEmpty = errors.New("empty recording")
	// ErrSilent: every sample is the same value (digital silence, or a
	// constant offset), so there is nothing to hear.
	ErrSilent = errors.New("silent recording")
	// ErrTooLong: longer than MaxDuration or MaxSamples.
	ErrTooLong = errors.New("recording too long")
)
