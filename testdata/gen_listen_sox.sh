#!/bin/sh
# Makes the outside-source recordings for calc/listen's tests with Debian's
# sox (apt-get install -y sox). Run by hand from anywhere:
#
#   sh testdata/gen_listen_sox.sh
#
# and commit the listen_sox_* files it writes. CI never runs it. -R makes
# sox's dither repeatable.
set -eu
cd "$(dirname "$0")"
sox --version | sed 's/^sox: *//' > listen_sox_version.txt

# 1. A steady sine of 431.7 Hz at half full scale: 0.5 s, 8 kHz, 16-bit PCM, mono.
sox -R -n -r 8000 -b 16 -e signed-integer -c 1 listen_sox_sine16.wav synth 0.5 sine 431.7 vol 0.5

# 2. A sine of 1234.5 Hz: 0.3 s, 11.025 kHz, 24-bit PCM, stereo.
sox -R -n -r 11025 -b 24 -e signed-integer -c 2 listen_sox_sine24.wav synth 0.3 sine 1234.5 vol 0.5

# 3. A sine of 300.3 Hz: 0.25 s, 16 kHz, 32-bit float, mono.
sox -R -n -r 16000 -b 32 -e floating-point -c 1 listen_sox_float32.wav synth 0.25 sine 300.3 vol 0.5

# 4. A ring-down: 0.1 s of silence, one full-scale sample, silence to 0.5 s,
#    through sox's two-pole band-pass filter at 523.3 Hz with Q = 50, then
#    normalised to -3 dBFS: 8 kHz, 16-bit PCM, mono. The filter's impulse
#    response is a decaying sinusoid whose decay time and frequency follow
#    from its poles.
tmp=$(mktemp)
trap 'rm -f "$tmp"' EXIT
head -c 1600 /dev/zero > "$tmp"
printf '\377\177' >> "$tmp"
head -c 6398 /dev/zero >> "$tmp"
sox -R -t raw -r 8000 -e signed-integer -b 16 -c 1 "$tmp" -b 16 listen_sox_ring16.wav bandpass 523.3 50q gain -n -3

# The filter's coefficients as sox itself reports them (b; a with a0 = 1),
# from which the test computes the ring's decay time and frequency.
sox --plot octave -r 8000 -n -n bandpass 523.3 50q | grep freqz > listen_sox_ring16_filter.txt
