package geometry

import (
	"reflect"
	"strconv"
	"strings"
	"sync"

	"github.com/BurntSushi/toml"
)

// node is one table of the file's shape: the keys it may hold and, for each,
// whether it is a value, a table or a list of tables.
type node struct {
	keys  []string
	sub   map[string]*node // tables and lists of tables
	list  map[string]bool  // lists of tables ([[opening]])
	typ   reflect.Type     // a struct of one *toml.Primitive per key
	known string           // the keys for messages: "kind, strength, ..."
}

func newNode(keys ...string) *node {
	return &node{keys: keys, sub: map[string]*node{}, list: map[string]bool{}}
}

func (n *node) add(key string) {
	for _, k := range n.keys {
		if k == key {
			return
		}
	}
	n.keys = append(n.keys, key)
}

// finish builds the struct the decoder fills: decoding into it marks the
// known keys as decoded, so that toml.MetaData.Undecoded lists the others.
func (n *node) finish() {
	prim := reflect.TypeOf((*toml.Primitive)(nil))
	fields := make([]reflect.StructField, len(n.keys))
	for i, k := range n.keys {
		fields[i] = reflect.StructField{Name: "F" + strconv.Itoa(i), Type: prim, Tag: reflect.StructTag(`toml:"` + k + `"`)}
	}
	n.typ = reflect.StructOf(fields)
	n.known = strings.Join(n.keys, ", ")
	for _, s := range n.sub {
		s.finish()
	}
}

// fields returns the keys the file gave, from a decoded struct of n.typ.
func (n *node) fields(v reflect.Value) map[string]*toml.Primitive {
	m := map[string]*toml.Primitive{}
	v = reflect.Indirect(v)
	for i, k := range n.keys {
		if p := v.Field(i).Interface().(*toml.Primitive); p != nil {
			m[k] = p
		}
	}
	return m
}

// lookup returns the node of a key path without indices ("variant.opening").
func (n *node) lookup(path []string) *node {
	for _, k := range path {
		s, ok := n.sub[k]
		if !ok {
			return nil
		}
		n = s
	}
	return n
}

// schema is the shape of a wall file, made from Settings.
type schema struct {
	top, opening, variant *node
}

var openingKeys = []string{"name", "x", "sill", "width", "height"}

// schemaOf returns the schema of the current Settings, built once for
// each version of the table (tests add a setting by replacing the slice).
func schemaOf() *schema {
	schemaCache.Lock()
	defer schemaCache.Unlock()
	key := schemaKey{n: len(Settings)}
	if len(Settings) > 0 {
		key.first = &Settings[0]
	}
	if schemaCache.sc == nil || schemaCache.key != key {
		schemaCache.sc, schemaCache.key = buildSchema(), key
	}
	return schemaCache.sc
}

type schemaKey struct {
	first *Setting
	n     int
}

var schemaCache struct {
	sync.Mutex
	key schemaKey
	sc  *schema
}

func buildSchema() *schema {
	sc := &schema{top: newNode(), opening: newNode(openingKeys...), variant: newNode("name", "opening")}
	for i := range Settings {
		s := &Settings[i]
		table, name := s.split()
		if table == "" {
			sc.top.add(name)
			continue
		}
		t, ok := sc.top.sub[table]
		if !ok {
			t = newNode()
			sc.top.sub[table] = t
		}
		t.add(name)
	}
	sc.top.add("layout")
	sc.top.add("active")
	for _, t := range settingTables() {
		sc.top.add(t)
	}
	sc.top.add("opening")
	sc.top.add("variant")
	sc.top.sub["opening"], sc.top.list["opening"] = sc.opening, true
	sc.top.sub["variant"], sc.top.list["variant"] = sc.variant, true
	sc.variant.sub["opening"], sc.variant.list["opening"] = sc.opening, true
	sc.top.finish()
	return sc
}
