package main

import (
	"encoding/csv"
	"fmt"
	"io"
	"strconv"
)

// writeCSV writes a sweep as comma-separated values: one header line, then
// one line per row. Header names should carry their unit ("temperature_K",
// "frequency_Hz"). Numbers are written with the shortest text that reads
// back to the same float64 (strconv 'g', precision -1). A row of the wrong
// length or a NaN or ±Inf value is an error and nothing is written.
func writeCSV(w io.Writer, header []string, rows [][]float64) error {
	if err := checkTable(header, rows); err != nil {
		return err
	}
	cw := csv.NewWriter(w)
	if err := cw.Write(header); err != nil {
		return err
	}
	rec := make([]string, len(header))
	for _, row := range rows {
		for j, v := range row {
			rec[j] = strconv.FormatFloat(v, 'g', -1, 64)
		}
		if err := cw.Write(rec); err != nil {
			return err
		}
	}
	cw.Flush()
	return cw.Error()
}

// checkTable reports the first problem of a sweep table: no columns, a row
// of the wrong length, or a value that is not finite.
func checkTable(header []string, rows [][]float64) error {
	if len(header) == 0 {
		return fmt.Errorf("csv: no columns")
	}
	for i, row := range rows {
		if len(row) != len(header) {
			return fmt.Errorf("csv: row %d has %d values for %d columns", i+1, len(row), len(header))
		}
		for j, v := range row {
			if !finite(v) {
				return fmt.Errorf("csv: row %d column %s is %v, not a finite number", i+1, header[j], v)
			}
		}
	}
	return nil
}
