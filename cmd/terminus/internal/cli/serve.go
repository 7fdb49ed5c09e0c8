package cli

import (
	"context"
	"errors"
	"fmt"
	"net"
	"net/http"
	"strconv"
	"time"

	"github.com/spf13/cobra"

	"terminus/cmd/terminus/internal/serve"
	"terminus/constraint/casefile"
	"terminus/constraint/input"
	"terminus/examples"
)

// NewServeCmd builds "terminus serve".
func NewServeCmd(s IO) *cobra.Command {
	var (
		port     int
		listen   string
		matFiles []string
		maxSize  string
	)
	cmd := &cobra.Command{
		Use:   "serve",
		Short: "Open a local page to edit a case and see its dating as you type",
		Long: `Serve starts a small web server on this computer and prints the address of
its page. On the page you can start from a blank case, an example or a case
file of your own; edit the object, its events and their order, the findings
(with a search over every material, marker and family of the dataset), the
records and the claims; see the windows, verdicts, conflicts, the timeline and
the chains of evidence change as you type; download the case file and the
reports; and browse the materials.

The page is computed by the same reader and reasoner as 'terminus check'. The
server listens on the loopback interface (127.0.0.1) only, so that no other
computer can reach it, unless --listen names another address; the page loads
nothing from elsewhere. Ctrl-C stops it.`,
		Example: `  terminus serve
  terminus serve --port 0                      # any free port
  terminus serve --materials examples/own-materials.yaml
  terminus serve --listen 0.0.0.0 --port 8047  # reachable from the network: only on a network you trust`,
		Args: cobra.NoArgs,
		RunE: func(cmd *cobra.Command, args []string) error {
			if port < 0 || port > 65535 {
				return usageError(fmt.Errorf("--port %d: expected 0 (any free port) to 65535", port))
			}
			ip := net.ParseIP(listen)
			if listen != "localhost" && ip == nil {
				return usageError(fmt.Errorf("--listen %q: expected an IP address of this computer, such as 127.0.0.1", listen))
			}
			maxBytes := int64(serve.DefaultMaxBytes)
			if maxSize != "" {
				n, err := parseSize(maxSize)
				if err != nil {
					return usageError(err)
				}
				maxBytes = n
			}
			opts, err := serveOptions(matFiles, maxBytes)
			if err != nil {
				return err
			}
			ln, err := net.Listen("tcp", net.JoinHostPort(listen, strconv.Itoa(port)))
			if err != nil {
				return usageError(&hintError{err: fmt.Errorf("cannot listen on %s port %d: %w", listen, port, err), hint: "another program may use the port: try --port 0 for any free one"})
			}
			addr := ln.Addr().(*net.TCPAddr)
			loopback := addr.IP.IsLoopback()
			// Reached through the network, the page is named by an IP
			// address; a host name is refused all the same.
			opts.AnyIP = !loopback
			srv, err := serve.New(opts)
			if err != nil {
				ln.Close()
				return err
			}
			fmt.Fprintf(s.Out, "terminus serve: the page is at http://%s/\n", ln.Addr())
			if !loopback {
				fmt.Fprintf(s.Out, "terminus serve: listening on %s: other computers can reach this page; stop it when you are done\n", addr.IP)
			}
			fmt.Fprintln(s.Out, "terminus serve: Ctrl-C stops it")
			return runServer(cmd.Context(), srv, ln)
		},
	}
	f := cmd.Flags()
	f.IntVar(&port, "port", 8047, "the port to listen on; 0 picks a free one")
	f.StringVar(&listen, "listen", "127.0.0.1", "the address to listen on; anything but a loopback address lets other computers reach the page")
	f.StringArrayVar(&matFiles, "materials", nil, "a materials file (YAML or TOML) to add over the built-in dataset; repeatable")
	f.StringVar(&maxSize, "max-input-size", "", "the largest request the page may send, such as a case file (default 1MiB)")
	return cmd
}

// serveOptions are the page's dataset (the built-in one with the user's
// files over it) and its examples.
func serveOptions(matFiles []string, maxBytes int64) (serve.Options, error) {
	ds, notes, err := datasetWith(matFiles)
	if err != nil {
		return serve.Options{}, usageError(err)
	}
	cases, err := examples.Cases()
	if err != nil {
		return serve.Options{}, err
	}
	var exs []serve.Example
	for _, c := range cases {
		e := serve.Example{Name: c.Name, File: c.File, Data: c.Data}
		if parsed, err := casefile.Parse(c.Name+"/"+c.File, c.Data, input.FormatOf(c.File), input.Limits{}); err == nil {
			e.Title = parsed.Title
		}
		exs = append(exs, e)
	}
	return serve.Options{Dataset: ds, Notes: notes, Examples: exs, MaxBytes: maxBytes}, nil
}

// runServer serves until ctx ends, then stops within a few seconds.
func runServer(ctx context.Context, h http.Handler, ln net.Listener) error {
	srv := &http.Server{Handler: h, ReadHeaderTimeout: 10 * time.Second, ReadTimeout: time.Minute, WriteTimeout: time.Minute, MaxHeaderBytes: 64 << 10}
	done := make(chan error, 1)
	go func() { done <- srv.Serve(ln) }()
	select {
	case err := <-done:
		return err
	case <-ctx.Done():
		shut, cancel := context.WithTimeout(context.Background(), 5*time.Second)
		defer cancel()
		if err := srv.Shutdown(shut); err != nil {
			return err
		}
		if err := <-done; err != nil && !errors.Is(err, http.ErrServerClosed) {
			return err
		}
		return nil
	}
}
