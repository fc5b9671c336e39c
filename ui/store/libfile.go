package store

import (
	"errors"
	"fmt"
	"io/fs"
	"os"
	"time"
)

// ReadLibraryFile reads an export file. A missing file is an empty library
// when missingOK; a damaged one is an error that says the file was left
// as it is.
func ReadLibraryFile(path string, missingOK bool) (*Library, error) {
	data, err := os.ReadFile(path)
	if missingOK && errors.Is(err, fs.ErrNotExist) {
		return NewLibrary(), nil
	}
	if err != nil {
		return nil, err
	}
	lib, err := ParseLibrary(data)
	if err != nil {
		return nil, fmt.Errorf("%w; the file was left as it is", err)
	}
	return lib, nil
}

// AppendLogFile adds e (its time set now when zero) to the log of the
// export file at path, made when missing, written atomically; a damaged
// file is refused and kept.
func AppendLogFile(path string, e Entry) error {
	lib, err := ReadLibraryFile(path, true)
	if err != nil {
		return err
	}
	if e.Time.IsZero() {
		e.Time = time.Now()
	}
	lib.Log = append(lib.Log, e)
	data, err := lib.Marshal()
	if err != nil {
		return err
	}
	return WriteFileAtomic(path, data, 0o644)
}
