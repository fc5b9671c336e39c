package main

import (
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"
)

// TestGogioArgs checks the packager's command line: our app ID, name,
// icon, version and the version stamp in the linker flags.
func TestGogioArgs(t *testing.T) {
	got := gogioArgs("0.1.44", "v1.2-3-gabc", "build/tubewright.apk")
	want := []string{"-target", "android", "-arch", "arm64,arm", "-appid", "org.tubewright.app",
		"-name", "Tubewright", "-version", "0.1.44", "-icon", "assets/web/icon-512.png",
		"-ldflags", "-s -w -X tubewright/ui.Version=v1.2-3-gabc", "-o", "build/tubewright.apk", "./cmd/tubewright"}
	if !slices.Equal(got, want) {
		t.Errorf("gogio args\n got %q\nwant %q", got, want)
	}
	if _, err := os.Stat(filepath.Join("..", "..", icon)); err != nil {
		t.Errorf("the icon %s is missing: %v", icon, err)
	}
}

// TestVersion checks the versionCode (major<<16 | minor<<8 | patch, as
// gogio writes it) equals the commit count, and the bounds.
func TestVersion(t *testing.T) {
	for _, n := range []int{1, 255, 256, 312, 65535} {
		v, err := version(n)
		if err != nil {
			t.Fatal(err)
		}
		var major, minor, patch int
		if _, err := fmt.Sscanf(v, "%d.%d.%d", &major, &minor, &patch); err != nil {
			t.Fatalf("version(%d) = %q: %v", n, v, err)
		}
		if code := major<<16 | minor<<8 | patch; code != n || minor > 255 || patch > 255 {
			t.Errorf("version(%d) = %q, versionCode %d", n, v, code)
		}
	}
	for _, n := range []int{0, 65536} {
		if _, err := version(n); err == nil {
			t.Errorf("version(%d) should fail", n)
		}
	}
}

// TestFindReportsEverythingMissing checks an empty machine is told about
// the SDK and the JDK.
func TestFindReportsEverythingMissing(t *testing.T) {
	_, missing := find(func(string) string { return "" }, func(string) (string, error) { return "", errors.New("no") })
	text := strings.Join(missing, "\n")
	for _, w := range []string{"Android SDK", "JDK"} {
		if !strings.Contains(text, w) {
			t.Errorf("missing list %q does not mention %s", text, w)
		}
	}
	if !strings.Contains(install, "ndk;") || !strings.Contains(install, "openjdk") {
		t.Error("the install text does not name the NDK and the JDK")
	}
}

// TestFindSDKLayout builds a fake SDK tree and checks the newest platform,
// build tools and NDK are found, and that a missing NDK is reported.
func TestFindSDKLayout(t *testing.T) {
	sdk := t.TempDir()
	touch := func(p string) {
		t.Helper()
		p = filepath.Join(sdk, p)
		if err := os.MkdirAll(filepath.Dir(p), 0o755); err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(p, nil, 0o755); err != nil {
			t.Fatal(err)
		}
	}
	touch("platforms/android-33/android.jar")
	touch("platforms/android-34/android.jar")
	touch("build-tools/34.0.0/d8")
	touch("build-tools/34.0.0/aapt2")
	touch("build-tools/35.0.0/d8") // incomplete: no aapt2
	env := map[string]string{"ANDROID_HOME": sdk}
	look := func(string) (string, error) { return "/usr/bin/javac", nil }
	_, missing := find(func(k string) string { return env[k] }, look)
	if len(missing) != 1 || !strings.Contains(missing[0], "NDK") {
		t.Fatalf("without an NDK: missing %q, want only the NDK", missing)
	}
	touch("ndk/26.3.11579264/toolchains/llvm/x")
	tc, missing := find(func(k string) string { return env[k] }, look)
	if len(missing) != 0 {
		t.Fatalf("missing %q", missing)
	}
	if tc.platform != filepath.Join(sdk, "platforms", "android-34") || tc.buildTools != filepath.Join(sdk, "build-tools", "34.0.0") ||
		tc.ndk != filepath.Join(sdk, "ndk", "26.3.11579264") || tc.javac != "/usr/bin/javac" {
		t.Errorf("found %+v", tc)
	}
	e := gogioEnv(nil, tc)
	for _, w := range []string{"ANDROID_SDK_ROOT=" + sdk, "ANDROID_NDK_ROOT=" + tc.ndk} {
		if !slices.Contains(e, w) {
			t.Errorf("gogio environment %q lacks %s", e, w)
		}
	}
}
