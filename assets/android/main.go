// Command android builds the Android package of the app with Gio's
// packager, gogio, where an Android SDK, NDK and JDK are installed, and
// otherwise says exactly what to install.
//
//	go run ./assets/android -count 312 -stamp v0.3-12-gabc -o build/tubewright.apk
//
// gogio has no tagged versions; the Go module proxy serves the pinned
// pseudo-version below, which is built in a throwaway module under build/
// (go install of a pseudo-version of a module without tags fails).
package main

import (
	"errors"
	"flag"
	"fmt"
	"os"
	"os/exec"
	"path/filepath"
	"slices"
	"strings"
)

const (
	// gogioModule is Gio's packager at the pinned version.
	gogioModule = "gioui.org/cmd"
	gogioPin    = "v0.0.0-20240115171100-84ca391d514b"
	// appID is the Android application ID of Tubewright.
	appID = "org.tubewright.app"
	// appName is the name under the icon.
	appName = "Tubewright"
	// icon is the app icon, drawn by us (assets/make-icons.sh).
	icon = "assets/web/icon-512.png"
	// versionVar is the variable the version stamp goes into.
	versionVar = "tubewright/ui.Version"
)

// toolchain is what gogio needs on the machine.
type toolchain struct {
	sdk, ndk, javac string
	platform        string // platforms/android-N holding android.jar
	buildTools      string // build-tools/V holding d8 and aapt2
}

// install is what to install when something is missing: Debian's JDK, and
// the SDK parts through Google's sdkmanager (Debian has no NDK).
const install = `  sudo apt-get install -y --no-install-recommends openjdk-17-jdk-headless
  # the Android command-line tools (sdkmanager), unpacked under $ANDROID_HOME/cmdline-tools/latest, then:
  sdkmanager "platform-tools" "platforms;android-34" "build-tools;34.0.0" "ndk;26.3.11579264"
  export ANDROID_HOME=/path/to/the/sdk`

// find looks for the toolchain from the environment (getenv) and reports
// every missing part.
func find(getenv func(string) string, lookPath func(string) (string, error)) (toolchain, []string) {
	var t toolchain
	var missing []string
	t.sdk = getenv("ANDROID_HOME")
	if t.sdk == "" {
		t.sdk = getenv("ANDROID_SDK_ROOT")
	}
	if t.sdk == "" || !exists(t.sdk) {
		missing = append(missing, "the Android SDK: set ANDROID_HOME (or ANDROID_SDK_ROOT) to its folder")
	} else {
		t.platform = latest(filepath.Join(t.sdk, "platforms", "android-*"), "android.jar")
		if t.platform == "" {
			missing = append(missing, "an SDK platform (platforms/android-N/android.jar)")
		}
		t.buildTools = latest(filepath.Join(t.sdk, "build-tools", "*"), "d8", "aapt2")
		if t.buildTools == "" {
			missing = append(missing, "the SDK build tools (build-tools/V with d8 and aapt2)")
		}
		t.ndk = getenv("ANDROID_NDK_ROOT")
		if t.ndk == "" {
			t.ndk = latest(filepath.Join(t.sdk, "ndk", "*"), "toolchains")
		}
		if t.ndk == "" && exists(filepath.Join(t.sdk, "ndk-bundle")) {
			t.ndk = filepath.Join(t.sdk, "ndk-bundle")
		}
		if t.ndk == "" || !exists(t.ndk) {
			missing = append(missing, "the Android NDK (ndk/VERSION in the SDK, or ANDROID_NDK_ROOT)")
		}
	}
	if j := getenv("JAVA_HOME"); j != "" {
		t.javac = filepath.Join(j, "bin", "javac")
		if !exists(t.javac) {
			t.javac = ""
		}
	} else if p, err := lookPath("javac"); err == nil {
		t.javac = p
	}
	if t.javac == "" {
		missing = append(missing, "a JDK (javac)")
	}
	return t, missing
}

// exists reports whether path exists.
func exists(path string) bool {
	_, err := os.Stat(path)
	return err == nil
}

// latest returns the last (by name) folder matching pattern that holds
// all of files, or "".
func latest(pattern string, files ...string) string {
	m, _ := filepath.Glob(pattern)
	slices.Sort(m)
	for i := len(m) - 1; i >= 0; i-- {
		ok := true
		for _, f := range files {
			if !exists(filepath.Join(m[i], f)) {
				ok = false
			}
		}
		if ok {
			return m[i]
		}
	}
	return ""
}

// version turns a commit count into gogio's major.minor.patch, whose
// Android versionCode is major<<16 | minor<<8 | patch: 0.(n/256).(n%256)
// makes the versionCode the commit count, so every build is newer.
func version(count int) (string, error) {
	if count < 1 || count >= 1<<16 {
		return "", fmt.Errorf("commit count %d is outside 1..65535", count)
	}
	return fmt.Sprintf("0.%d.%d", count/256, count%256), nil
}

// gogioArgs assembles gogio's command line.
func gogioArgs(ver, stamp, out string) []string {
	return []string{
		"-target", "android",
		"-arch", "arm64,arm",
		"-appid", appID,
		"-name", appName,
		"-version", ver,
		"-icon", icon,
		"-ldflags", "-s -w -X " + versionVar + "=" + stamp,
		"-o", out,
		"./cmd/tubewright",
	}
}

// gogioEnv is the environment gogio runs in: the SDK and NDK under the
// names it reads.
func gogioEnv(base []string, t toolchain) []string {
	env := slices.Clone(base)
	env = append(env, "ANDROID_SDK_ROOT="+t.sdk, "ANDROID_HOME="+t.sdk, "ANDROID_NDK_ROOT="+t.ndk)
	if t.javac != "" {
		env = append(env, "PATH="+filepath.Dir(t.javac)+string(os.PathListSeparator)+os.Getenv("PATH"))
	}
	return env
}

// buildGogio builds the pinned gogio into dir/gogio from a throwaway
// module and returns its path.
func buildGogio(dir string) (string, error) {
	if err := os.MkdirAll(dir, 0o755); err != nil {
		return "", err
	}
	mod := "module gogiobuild\n\ngo 1.26\n\nrequire " + gogioModule + " " + gogioPin + "\n"
	if err := os.WriteFile(filepath.Join(dir, "go.mod"), []byte(mod), 0o644); err != nil {
		return "", err
	}
	bin, err := filepath.Abs(filepath.Join(dir, "gogio"))
	if err != nil {
		return "", err
	}
	for _, args := range [][]string{
		{"mod", "download", gogioModule + "@" + gogioPin},
		{"build", "-mod=mod", "-o", bin, gogioModule + "/gogio"},
	} {
		cmd := exec.Command("go", args...)
		cmd.Dir = dir
		cmd.Stdout, cmd.Stderr = os.Stdout, os.Stderr
		if err := cmd.Run(); err != nil {
			return "", fmt.Errorf("go %s: %v", strings.Join(args, " "), err)
		}
	}
	return bin, nil
}

func main() {
	count := flag.Int("count", 1, "commit count, for the Android versionCode")
	stamp := flag.String("stamp", "dev", "version stamp shown in the app")
	out := flag.String("o", "build/tubewright.apk", "the package to write")
	work := flag.String("work", "build/gogio", "folder for building gogio")
	flag.Parse()
	t, missing := find(os.Getenv, exec.LookPath)
	if len(missing) > 0 {
		fmt.Fprintln(os.Stderr, "make apk: cannot build the Android package; missing:")
		for _, m := range missing {
			fmt.Fprintln(os.Stderr, "  -", m)
		}
		fmt.Fprintln(os.Stderr, "Install them with:")
		fmt.Fprintln(os.Stderr, install)
		os.Exit(2)
	}
	ver, err := version(*count)
	if err == nil {
		var gogio string
		if gogio, err = buildGogio(*work); err == nil {
			cmd := exec.Command(gogio, gogioArgs(ver, *stamp, *out)...)
			cmd.Env = gogioEnv(os.Environ(), t)
			cmd.Stdout, cmd.Stderr = os.Stdout, os.Stderr
			fmt.Println(gogio, strings.Join(cmd.Args[1:], " "))
			err = cmd.Run()
		}
	}
	if err != nil {
		var ee *exec.ExitError
		if errors.As(err, &ee) {
			os.Exit(ee.ExitCode())
		}
		fmt.Fprintln(os.Stderr, "make apk:", err)
		os.Exit(1)
	}
	fmt.Println("make apk: wrote", *out)
}
