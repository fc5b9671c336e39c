package main

import (
	"encoding/csv"
	"fmt"
	"io"

	"tubewright/calc/units"
)

// csvDigits is the number of significant digits of a CSV value: the
// methods behind the sweeps (property fits, the linear model, first-order
// uncertainties) do not support more than about 7, and a relative rounding
// of at most 5e-7 is far below any of their errors (our own choice).
const csvDigits = 7

// writeCSV writes a sweep as comma-separated values: one header line, then
// one line per row. Header names should carry their unit ("temperature_K",
// "frequency_Hz"). Numbers are written in plain decimals with csvDigits
// significant digits, never with an exponent. A row of the wrong
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
			rec[j] = units.Decimal(v, csvDigits)
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
