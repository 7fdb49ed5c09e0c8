package materials_test

import (
	"fmt"

	"terminus/materials"
)

func ExampleDataset_Lookup() {
	d, err := materials.LoadFile("testdata/good.yaml")
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, q := range []string{"Berlin-Blue", "PB 27", "C.I. 77510", "14038-43-8", "preussischblau"} {
		m, err := d.Lookup(q)
		if err != nil {
			fmt.Println(err)
			continue
		}
		fmt.Printf("%s → %s\n", q, m.ID)
	}
	_, err = d.Lookup("prusian blue")
	fmt.Println(err)
	// Output:
	// Berlin-Blue → prussian-blue
	// PB 27 → prussian-blue
	// C.I. 77510 → prussian-blue
	// 14038-43-8 → prussian-blue
	// preussischblau → prussian-blue
	// no material named "prusian blue" in the dataset
}

func ExampleDataset_Arrival() {
	d, err := materials.LoadFile("testdata/good.yaml")
	if err != nil {
		fmt.Println(err)
		return
	}
	m, _ := d.Lookup("Prussian blue")
	for _, place := range []string{"JP", "KR", "NL"} {
		claims, area := d.Arrival(m, place)
		if len(claims) == 0 {
			fmt.Printf("%s: no arrival recorded\n", place)
			continue
		}
		fmt.Printf("%s: %s, as recorded for %s (%s)\n", place, claims[0].Date.EDTF(), area, d.Regions.Name(area))
	}
	// Output:
	// JP: 1830~, as recorded for JP (Japan)
	// KR: 1840, as recorded for 030 (Eastern Asia)
	// NL: no arrival recorded
}
