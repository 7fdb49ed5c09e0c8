package survey_test

import (
	"context"
	"fmt"
	"os"
	"strings"

	"terminus/cmd/terminus/internal/survey"
	"terminus/materials"
)

// Survey a small CSV collection (read here from a string as if from
// standard input) against the invented materials of the reasoner's tests,
// and write the csv summary.
func ExampleRun() {
	ds, err := materials.LoadFile("../../../../constraint/testdata/fixture-materials.yaml")
	if err != nil {
		fmt.Println(err)
		return
	}
	collection := "id,place,materials,claim,shelf\n" +
		"sign-1,NL,fixture yellow,1840,A1\n" +
		"sign-2,NL,fixture yellow,1800,A2\n" +
		"sign-3,NL,fixture yelow,1840,A3\n"
	in, err := survey.Open("-", strings.NewReader(collection), survey.CSV)
	if err != nil {
		fmt.Println(err)
		return
	}
	w := survey.NewCSVWriter(os.Stdout, in.Free)
	counts, err := survey.Run(context.Background(), []*survey.Input{in}, w, survey.Options{Dataset: ds, Workers: 2})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(counts)
	// Output:
	// id,file,line,shelf,status,claims,event,hard_earliest,hard_latest,firm_earliest,firm_latest,soft_earliest,soft_latest,deciding,conflicts,error,hint
	// sign-1,stdin,2,A1,consistent,1840 consistent,making,1809-01-01,..,1816-01-01,..,1830-01-01,..,,,,
	// sign-2,stdin,3,A2,excluded,1800 excluded,making,1809-01-01,..,1816-01-01,..,1830-01-01,..,finding-1 (fixture yellow),,,
	// sign-3,stdin,4,A3,error,,,,,,,,,,,"stdin:4:11: finding finding-1: unknown material ""fixture yelow""","did you mean 'fixture yellow', 'fixture blue' or 'fixture red'?"
	// 3 records: 1 excluded, 1 error, 1 consistent
}
