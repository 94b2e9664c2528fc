package equipment

import (
	"bytes"
	"sync"

	"sepcost/templates"
)

// DefaultFile names the built-in table in messages and reports.
const DefaultFile = "built-in equipment table"

var defaultTable = sync.OnceValue(func() *Table {
	t, err := Read(bytes.NewReader(templates.Equipment), DefaultFile)
	if err != nil {
		panic("equipment: the built-in table does not read: " + err.Error())
	}
	return t
})

// Default is the built-in site equipment table (templates/equipment.csv:
// glass columns of 10–300 mm, steel process columns of 450 and 600 mm,
// prepacked cartridges of 12 g to 5 kg, rotary evaporators of 2 to 25 L/h,
// vessels, a filter and a dryer, with invented example rates and prices).
// It is shared: callers must not change it.
func Default() *Table { return defaultTable() }
