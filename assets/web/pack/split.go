package main

import (
	"bytes"
	"fmt"
	"os/exec"
	"strings"
)

// The xz form of the app is two xz streams, one after the other in one file
// (xz --decompress unpacks such a file whole): first the module up to its
// data section (header, tables and code), then the data section and what
// follows it. The page unpacks the two at once, each in its own worker, so
// unpacking takes about as long as the larger part alone on a machine with
// two cores. Each part gets LZMA2 settings that suit it, measured on the
// app: code lc=4 pb=0 (WebAssembly code is a byte stream with no
// alignment), data lc=0 lp=2 pb=2 (Go's tables of 4-byte fields). Together
// they were 0.8 % smaller than one stream with pb=0.
const (
	xzCodeFilter = "--lzma2=preset=9e,lc=4,pb=0"
	xzDataFilter = "--lzma2=preset=9e,lc=0,lp=2,pb=2"
)

// wasmDataSection is the WebAssembly section id of the data section.
const wasmDataSection = 11

// dataSectionStart returns the offset of the data section's first byte (its
// id) in the WebAssembly module b, or len(b) when b is not a module or has
// no data section. It reads the section headers only: id, then size as an
// unsigned LEB128 (WebAssembly Core Specification 2.0, 5.5.2).
func dataSectionStart(b []byte) int {
	if len(b) < 8 || !bytes.Equal(b[:4], []byte("\x00asm")) {
		return len(b)
	}
	p := 8
	for p < len(b) {
		start := p
		id := b[p]
		p++
		size, n := uleb128(b[p:])
		if n == 0 || size > uint64(len(b)-p-n) {
			return len(b)
		}
		if id == wasmDataSection {
			return start
		}
		p += n + int(size)
	}
	return len(b)
}

// uleb128 reads an unsigned LEB128 number of at most 5 bytes (a u32) from
// b; n is the bytes read, 0 when b holds no complete number.
func uleb128(b []byte) (v uint64, n int) {
	for i := 0; i < len(b) && i < 5; i++ {
		v |= uint64(b[i]&0x7f) << (7 * i)
		if b[i]&0x80 == 0 {
			return v, i + 1
		}
	}
	return 0, 0
}

// xzApp compresses the app as two xz streams (see above) and returns the
// file and the length of its first stream, where the second begins. A file
// that is not a module with a data section is one stream (split = length).
func xzApp(b []byte) (file []byte, split int, err error) {
	cut := dataSectionStart(b)
	code, err := xzBytes(b[:cut], xzCodeFilter)
	if err != nil {
		return nil, 0, err
	}
	if cut == len(b) {
		return code, len(code), nil
	}
	data, err := xzBytes(b[cut:], xzDataFilter)
	if err != nil {
		return nil, 0, err
	}
	return append(code, data...), len(code), nil
}

// xzBytes compresses b with the xz command and the given LZMA2 filter, with
// a CRC32 check (xz-embedded, the page's decoder, checks CRC32).
func xzBytes(b []byte, filter string) ([]byte, error) {
	cmd := exec.Command("xz", "--format=xz", "--check=crc32", filter, "--stdout", "-")
	cmd.Stdin = bytes.NewReader(b)
	var out, errb bytes.Buffer
	cmd.Stdout, cmd.Stderr = &out, &errb
	if err := cmd.Run(); err != nil {
		return nil, fmt.Errorf("xz (Debian package xz-utils): %v %s", err, strings.TrimSpace(errb.String()))
	}
	return out.Bytes(), nil
}
