// The local page of terminus. It edits a case and shows what the server
// answers: every check, error and report is computed by the server with
// the same reader, reasoner and writers as the command line. Nothing here
// reasons about dates or materials.
'use strict';

const $ = (sel, root = document) => root.querySelector(sel);
const el = (tag, attrs = {}, ...kids) => {
  const e = document.createElement(tag);
  for (const [k, v] of Object.entries(attrs)) {
    if (v === undefined || v === null || v === false) continue;
    if (k.startsWith('on')) e.addEventListener(k.slice(2), v);
    else if (k === 'text') e.textContent = v;
    else e.setAttribute(k, v === true ? '' : v);
  }
  for (const k of kids.flat()) if (k !== undefined && k !== null) e.append(k);
  return e;
};
let uid = 0;
const nextID = (p) => `${p}-${++uid}`;

// ---- the model: a case as the editor holds it -------------------------

const TIERS = ['hard', 'firm', 'soft'];
const RECORD_KINDS = [['not_before', 'not before'], ['not_after', 'not after'], ['on', 'on'], ['between', 'between']];
// The calendars and year starts a record's or a claim's date may be read in
// (date.CalendarNames and date.ParseYearStart; a test keeps them in step).
const CALENDARS = ['gregorian', 'julian', 'japanese', 'chinese', 'korean', 'islamic', 'persian', 'hebrew', 'french republican', 'buddhist', 'roc'];
const CALENDAR_OPTIONS = [['', 'not said (Gregorian)'], ...CALENDARS.map((c) => [c, c])];
const YEAR_START_OPTIONS = [['', 'not said'], ['1 January', '1 January'], ['25 March', '25 March (England before 1752)'], ['1 March', '1 March (Venice)'], ['25 December', '25 December']];

function blank() {
  return { id: '', title: '', place: '', extra: {}, events: [], findings: [], records: [], claims: [] };
}
let model = blank();

const take = (o, keys) => {
  const extra = {};
  for (const [k, v] of Object.entries(o || {})) if (!keys.includes(k)) extra[k] = v;
  return extra;
};
const str = (v) => (v === undefined || v === null ? '' : String(v));

// fromCase reads a case file's tree (as the server sends it) into the model;
// keys the editor has no field for are kept and sent back as they were.
function fromCase(c) {
  const m = blank();
  m.id = str(c.id); m.title = str(c.title); m.place = str(c.place);
  m.extra = take(c, ['id', 'title', 'place', 'events', 'findings', 'records', 'claims']);
  for (const e of c.events || []) {
    let after = e.after || [];
    if (!Array.isArray(after)) after = [after];
    m.events.push({
      id: str(e.id), label: str(e.label), place: str(e.place), extra: take(e, ['id', 'label', 'place', 'after']),
      after: after.map((o) => (typeof o === 'string' ? { event: o, at_least: '', at_most: '', strength: '', extra: {} }
        : { event: str(o.event), at_least: str(o.at_least), at_most: str(o.at_most), strength: str(o.strength), extra: take(o, ['event', 'at_least', 'at_most', 'strength']) })),
    });
  }
  for (const f of c.findings || []) {
    const mats = Array.isArray(f.material) ? f.material.map(str) : (f.material === undefined ? [] : [str(f.material)]);
    m.findings.push({ id: str(f.id), materials: mats, event: str(f.event), confidence: str(f.confidence), method: str(f.method),
      sample: str(f.sample), unlisted: f.unlisted === true, extra: take(f, ['id', 'material', 'event', 'confidence', 'method', 'sample', 'unlisted']) });
  }
  for (const r of c.records || []) {
    const kind = (RECORD_KINDS.find(([k]) => r[k] !== undefined) || ['not_after'])[0];
    m.records.push({ id: str(r.id), event: str(r.event), kind, date: str(r[kind]), strength: str(r.strength), source: str(r.source),
      note: str(r.note), calendar: str(r.calendar), year_start: str(r.year_start),
      extra: take(r, ['id', 'event', 'on', 'not_before', 'not_after', 'between', 'strength', 'source', 'note', 'calendar', 'year_start']) });
  }
  for (const c2 of c.claims || []) {
    m.claims.push({ id: str(c2.id), event: str(c2.event), date: str(c2.date), by: str(c2.by), calendar: str(c2.calendar), year_start: str(c2.year_start),
      extra: take(c2, ['id', 'event', 'date', 'by', 'calendar', 'year_start']) });
  }
  return m;
}

// toCase writes the model as a case file's tree, leaving out what is empty
// (list items stay, so that paths in errors match the editor's).
function toCase(m) {
  const put = (o, k, v) => { if (v !== '' && v !== undefined && v !== false) o[k] = v; return o; };
  const c = {};
  put(c, 'id', m.id); put(c, 'title', m.title); put(c, 'place', m.place);
  Object.assign(c, m.extra);
  if (m.events.length) {
    c.events = m.events.map((e) => {
      const o = put(put(put({}, 'id', e.id), 'label', e.label), 'place', e.place);
      if (e.after.length) {
        o.after = e.after.map((a) => Object.assign(put(put(put(put({}, 'event', a.event), 'at_least', a.at_least), 'at_most', a.at_most), 'strength', a.strength), a.extra));
      }
      return Object.assign(o, e.extra);
    });
  }
  if (m.findings.length) {
    c.findings = m.findings.map((f) => {
      const o = put({}, 'id', f.id);
      if (f.materials.length) o.material = f.materials.length === 1 ? f.materials[0] : f.materials.slice();
      put(o, 'event', f.event); put(o, 'confidence', f.confidence); put(o, 'method', f.method); put(o, 'sample', f.sample);
      if (f.unlisted) o.unlisted = true;
      return Object.assign(o, f.extra);
    });
  }
  if (m.records.length) {
    c.records = m.records.map((r) => Object.assign(put(put(put(put(put(put(put(put({}, 'id', r.id), 'event', r.event), r.kind, r.date), 'strength', r.strength), 'source', r.source),
      'note', r.note), 'calendar', r.calendar), 'year_start', r.year_start), r.extra));
  }
  if (m.claims.length) {
    c.claims = m.claims.map((x) => Object.assign(put(put(put(put(put(put({}, 'id', x.id), 'event', x.event), 'date', x.date), 'by', x.by), 'calendar', x.calendar), 'year_start', x.year_start), x.extra));
  }
  return c;
}

// ---- talking to the server ---------------------------------------------

async function post(url, body, type = 'application/json') {
  return fetch(url, { method: 'POST', headers: { 'Content-Type': type }, body });
}

let checkTimer = null;
let checkSeq = 0;
function changed() {
  clearTimeout(checkTimer);
  checkTimer = setTimeout(runCheck, 180);
}

async function runCheck() {
  const seq = ++checkSeq;
  const resp = await post('/api/check', JSON.stringify(toCase(model)));
  if (seq !== checkSeq) return; // a newer edit is on its way
  const results = $('#results');
  clearErrors();
  if (!resp.ok) {
    setStatus(`The server could not check the case: ${await resp.text()}`, true);
    return;
  }
  const ans = await resp.json();
  if (!ans.ok) {
    showError(ans.error);
    results.classList.add('stale');
    setStatus(`The case has an error: ${ans.error.message}${ans.error.hint ? ` (hint: ${ans.error.hint})` : ''}. The results shown are of the last case without errors.`, true);
    return;
  }
  results.classList.remove('stale');
  results.replaceChildren(el('div', { class: 'terminus-report' }));
  results.firstChild.innerHTML = ans.html; // written by the server's html/template, every value escaped
  const tiersBad = TIERS.filter((t) => !ans.consistent[t]);
  const parts = (ans.claims || []).map((c) => `${c.id} (${c.date}): ${c.verdict}`);
  parts.push(tiersBad.length ? `the evidence conflicts at the ${tiersBad.join(' and ')} tier` : 'the evidence agrees at every tier');
  setStatus(`Verdicts: ${parts.join('; ')}.`, false);
}

function setStatus(text, bad) {
  const s = $('#status');
  s.textContent = text;
  s.classList.toggle('bad', bad);
}

function clearErrors() {
  for (const e of document.querySelectorAll('#editor .error')) e.remove();
  for (const e of document.querySelectorAll('#editor [aria-invalid]')) { e.removeAttribute('aria-invalid'); e.removeAttribute('aria-describedby'); }
  for (const e of document.querySelectorAll('#editor .has-error')) e.classList.remove('has-error');
}

// showError puts an error beside the field its path names, or, when the
// editor has no such field, beside the nearest part that holds it.
function showError(err) {
  const path = (err.path || []).map(String);
  const msg = el('p', { class: 'error', id: nextID('err') }, err.message, err.hint ? el('span', { class: 'hint', text: ` Hint: ${err.hint}.` }) : null);
  for (let n = path.length; n >= 0; n--) {
    const target = document.querySelector(`#editor [data-path="${CSS.escape(path.slice(0, n).join('.'))}"]`);
    if (!target) continue;
    if (target.matches('input,select')) {
      target.setAttribute('aria-invalid', 'true');
      target.setAttribute('aria-describedby', msg.id);
      (target.closest('.field') || target).after(msg);
    } else {
      target.classList.add('has-error');
      const head = target.querySelector('h3, legend');
      (head || target.firstChild).after(msg);
    }
    const card = target.closest('.card');
    if (card) card.classList.add('has-error');
    return;
  }
  $('#editor').prepend(msg);
}

async function download(format) {
  const resp = await post(`/api/export/${format}`, JSON.stringify(toCase(model)));
  if (!resp.ok) {
    setStatus(`Cannot download: ${await resp.text()}`, true);
    return;
  }
  const name = (/filename="([^"]+)"/.exec(resp.headers.get('Content-Disposition') || '') || [])[1] || 'download';
  const url = URL.createObjectURL(await resp.blob());
  const a = el('a', { href: url, download: name });
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10000);
  setStatus(`Downloaded ${name}.`, false);
}

async function loadCase(resp) {
  const ans = await resp.json();
  if (!ans.case) {
    setStatus(`The file cannot be read: ${ans.error.message}${ans.error.hint ? ` (hint: ${ans.error.hint})` : ''}`, true);
    return;
  }
  model = fromCase(ans.case);
  render();
  await runCheck();
}

// ---- the editor ----------------------------------------------------------

// field makes a labelled input bound to obj[key]; path is where the case
// file holds it, for errors.
function field(label, obj, key, path, opts = {}) {
  const id = nextID('f');
  const input = el('input', { id, value: obj[key], 'data-path': path, placeholder: opts.placeholder, list: opts.list, autocomplete: 'off' });
  input.addEventListener('input', () => { obj[key] = input.value; if (opts.onchange) opts.onchange(); changed(); });
  return el('div', { class: `field${opts.wide ? ' wide' : ''}` }, el('label', { for: id, text: label }), input);
}

function select(label, obj, key, path, options, opts = {}) {
  const id = nextID('f');
  const s = el('select', { id, 'data-path': path });
  for (const [v, text] of options) s.append(el('option', { value: v, text, selected: v === obj[key] }));
  if (!options.some(([v]) => v === obj[key]) && obj[key]) s.append(el('option', { value: obj[key], text: obj[key], selected: true }));
  s.addEventListener('change', () => { obj[key] = s.value; if (opts.onchange) opts.onchange(); changed(); });
  return el('div', { class: 'field' }, el('label', { for: id, text: label }), s);
}

const eventOptions = (none = 'the first event') => [['', none], ...model.events.filter((e) => e.id).map((e) => [e.id, e.label ? `${e.id}: ${e.label}` : e.id])];

function tools(list, i, name, rerender) {
  const b = (text, label, fn, disabled) => el('button', { type: 'button', 'aria-label': label, disabled, onclick: () => { fn(); rerender(); changed(); } }, text);
  return el('span', { class: 'tools' },
    b('↑', `move ${name} up`, () => list.splice(i - 1, 0, list.splice(i, 1)[0]), i === 0),
    b('↓', `move ${name} down`, () => list.splice(i + 1, 0, list.splice(i, 1)[0]), i === list.length - 1),
    b('Remove', `remove ${name}`, () => list.splice(i, 1)));
}

function render() {
  const form = $('#editor');
  form.replaceChildren(objectSection(), eventsSection(), findingsSection(), recordsSection(), claimsSection());
}

function rerenderSection(name, focusSel) {
  const old = document.querySelector(`#editor fieldset[data-path="${name}"]`);
  const fresh = { events: eventsSection, findings: findingsSection, records: recordsSection, claims: claimsSection }[name]();
  old.replaceWith(fresh);
  if (name === 'events') { // event choices appear in the other sections
    for (const s of ['findings', 'records', 'claims']) document.querySelector(`#editor fieldset[data-path="${s}"]`).replaceWith({ findings: findingsSection, records: recordsSection, claims: claimsSection }[s]());
  }
  if (focusSel) { const f = document.querySelector(focusSel); if (f) f.focus(); }
}

function objectSection() {
  return el('fieldset', { 'data-path': '' }, el('legend', { text: 'Object' }),
    el('div', { class: 'row' },
      field('Title', model, 'title', 'title', { wide: true }),
      field('Inventory number (id)', model, 'id', 'id'),
      field('Place of making (ISO 3166 or M49 code)', model, 'place', 'place', { list: 'places', placeholder: 'e.g. NL, 150' })));
}

function eventsSection() {
  const fs = el('fieldset', { 'data-path': 'events' }, el('legend', { text: 'Events' }),
    el('p', { class: 'note', text: model.events.length ? '' : 'No events: the case has one event, its making.' }));
  model.events.forEach((e, i) => {
    const card = el('div', { class: 'card', 'data-path': `events.${i}` },
      el('h3', {}, `Event ${i + 1}${e.id ? `: ${e.id}` : ''}`, tools(model.events, i, `event ${i + 1}`, () => rerenderSection('events'))),
      el('div', { class: 'row' },
        field('Id', e, 'id', `events.${i}.id`, { placeholder: 'e.g. making', onchange: () => {} }),
        field('Label', e, 'label', `events.${i}.label`),
        field('Place, if not the object\'s', e, 'place', `events.${i}.place`, { list: 'places' })));
    const orders = el('div', { class: 'orders', 'data-path': `events.${i}.after` }, el('strong', { text: 'Comes after' }));
    e.after.forEach((a, j) => {
      orders.append(el('div', { class: 'row', 'data-path': `events.${i}.after.${j}` },
        select('Event', a, 'event', `events.${i}.after.${j}.event`, eventOptions('choose…').filter(([v]) => v !== e.id)),
        field('At least (e.g. P1Y)', a, 'at_least', `events.${i}.after.${j}.at_least`),
        field('At most', a, 'at_most', `events.${i}.after.${j}.at_most`),
        select('Strength', a, 'strength', `events.${i}.after.${j}.strength`, [['', 'hard (default)'], ['firm', 'firm'], ['soft', 'soft']]),
        el('button', { type: 'button', 'aria-label': `remove order ${j + 1} of event ${i + 1}`, onclick: () => { e.after.splice(j, 1); rerenderSection('events'); changed(); } }, 'Remove')));
    });
    orders.append(el('button', { type: 'button', class: 'add', onclick: () => { e.after.push({ event: '', at_least: '', at_most: '', strength: '', extra: {} }); rerenderSection('events', `[data-path="events.${i}.after.${e.after.length - 1}.event"]`); } }, 'Add an order'));
    card.append(orders);
    fs.append(card);
  });
  fs.append(el('button', { type: 'button', class: 'add', onclick: () => {
    model.events.push({ id: model.events.length ? `event-${model.events.length + 1}` : 'making', label: '', place: '', after: [], extra: {} });
    rerenderSection('events', `[data-path="events.${model.events.length - 1}.id"]`); changed();
  } }, 'Add an event'));
  // Ids typed in an event change the choices elsewhere: refresh them when
  // the field is left.
  fs.addEventListener('focusout', (ev) => { if (ev.target.matches('[data-path$=".id"]')) setTimeout(() => refreshEventChoices(), 0); });
  return fs;
}

function refreshEventChoices() {
  const active = document.activeElement && document.activeElement.getAttribute('data-path');
  for (const s of ['findings', 'records', 'claims']) document.querySelector(`#editor fieldset[data-path="${s}"]`).replaceWith({ findings: findingsSection, records: recordsSection, claims: claimsSection }[s]());
  if (active) { const f = document.querySelector(`#editor [data-path="${CSS.escape(active)}"]`); if (f) f.focus(); }
}

function findingsSection() {
  const fs = el('fieldset', { 'data-path': 'findings' }, el('legend', { text: 'Findings' }));
  model.findings.forEach((f, i) => {
    const card = el('div', { class: 'card', 'data-path': `findings.${i}` },
      el('h3', {}, `Finding ${i + 1}${f.id ? `: ${f.id}` : ''}`, tools(model.findings, i, `finding ${i + 1}`, () => rerenderSection('findings'))),
      materialPicker(f, i),
      el('div', { class: 'row' },
        field('Id', f, 'id', `findings.${i}.id`),
        select('Event', f, 'event', `findings.${i}.event`, eventOptions()),
        select('Confidence', f, 'confidence', `findings.${i}.confidence`, [['', 'certain (default)'], ['probable', 'probable'], ['possible', 'possible']]),
        field('Method', f, 'method', `findings.${i}.method`, { placeholder: 'e.g. Raman' }),
        field('Sample', f, 'sample', `findings.${i}.sample`),
        checkbox('Not in the dataset (unlisted)', f, 'unlisted', `findings.${i}.unlisted`)));
    fs.append(card);
  });
  fs.append(el('button', { type: 'button', class: 'add', onclick: () => {
    model.findings.push({ id: `f-${model.findings.length + 1}`, materials: [], event: '', confidence: '', method: '', sample: '', unlisted: false, extra: {} });
    rerenderSection('findings', `[data-path="findings.${model.findings.length - 1}.material"]`); changed();
  } }, 'Add a finding'));
  return fs;
}

function checkbox(label, obj, key, path) {
  const id = nextID('f');
  const c = el('input', { type: 'checkbox', id, 'data-path': path, checked: obj[key] });
  c.addEventListener('change', () => { obj[key] = c.checked; changed(); });
  return el('div', { class: 'field check' }, c, el('label', { for: id, text: label }));
}

// materialPicker is a search box over every name, marker and family of the
// dataset (an ARIA combobox), the chosen materials as chips (several: one
// of them), and their milestones with sources.
function materialPicker(f, i) {
  const id = nextID('mat'), listID = nextID('list');
  const input = el('input', { id, role: 'combobox', 'aria-autocomplete': 'list', 'aria-expanded': 'false', 'aria-controls': listID,
    'data-path': `findings.${i}.material`, placeholder: 'type part of a name, a marker or a family', autocomplete: 'off' });
  const list = el('ul', { id: listID, role: 'listbox', hidden: true, 'aria-label': 'materials that match' });
  const chips = el('div', { class: 'chips', 'aria-label': 'chosen materials' });
  const info = el('div', {});
  let hits = [], active = -1, timer = null, listQuery = '', seq = 0;
  const close = () => { list.hidden = true; input.setAttribute('aria-expanded', 'false'); input.removeAttribute('aria-activedescendant'); active = -1; };
  const choose = (h) => {
    f.materials.push(h.name);
    input.value = '';
    close();
    drawChips();
    changed();
    input.focus();
  };
  const mark = () => {
    [...list.children].forEach((li, k) => li.setAttribute('aria-selected', String(k === active)));
    if (active >= 0) { input.setAttribute('aria-activedescendant', list.children[active].id); list.children[active].scrollIntoView({ block: 'nearest' }); }
  };
  // search asks the server for the names that match what is typed; an
  // answer to an older query is dropped.
  const search = async () => {
    const q = input.value.trim();
    const mine = ++seq;
    if (!q) { close(); return; }
    const found = await (await fetch(`/api/search?q=${encodeURIComponent(q)}`)).json();
    if (mine !== seq) return;
    hits = found;
    listQuery = q;
    list.replaceChildren(...hits.map((h, k) => el('li', { id: `${listID}-${k}`, role: 'option', 'aria-selected': 'false', onmousedown: (ev) => { ev.preventDefault(); choose(h); } },
      h.name, ' ', el('small', { text: h.kind === 'material' ? `— ${h.display !== h.name ? `${h.display}, ` : ''}${h.class}${h.made ? `, made ${h.made}` : ''}` : `— ${h.kind}: any of ${h.members.length} (${h.members.slice(0, 3).join(', ')}${h.members.length > 3 ? '…' : ''})` }))));
    if (!hits.length) list.append(el('li', { role: 'option', 'aria-disabled': 'true', text: 'no material, marker or family has that in its name' }));
    list.hidden = false;
    input.setAttribute('aria-expanded', 'true');
    active = -1;
  };
  input.addEventListener('input', () => {
    clearTimeout(timer);
    timer = setTimeout(search, 120);
  });
  input.addEventListener('keydown', (ev) => {
    if (ev.key === 'ArrowDown' || ev.key === 'ArrowUp') {
      if (list.hidden || !hits.length || listQuery !== input.value.trim()) return;
      ev.preventDefault();
      active = (active + (ev.key === 'ArrowDown' ? 1 : hits.length - 1)) % hits.length;
      mark();
    } else if (ev.key === 'Enter') {
      ev.preventDefault();
      if (input.value.trim() && listQuery !== input.value.trim()) { // typed faster than the list came
        clearTimeout(timer);
        search().then(() => { if (hits.length) choose(hits[0]); });
      } else if (!list.hidden && hits.length) {
        choose(hits[Math.max(active, 0)]);
      }
    } else if (ev.key === 'Escape') {
      close();
    }
  });
  input.addEventListener('blur', () => setTimeout(close, 150));
  function drawChips() {
    chips.replaceChildren();
    f.materials.forEach((name, k) => {
      if (k > 0) chips.append(el('span', { class: 'alt', text: 'or' }));
      chips.append(el('span', { class: 'chip' }, name, el('button', { type: 'button', 'aria-label': `remove ${name}`, onclick: () => { f.materials.splice(k, 1); drawChips(); changed(); } }, '×')));
    });
    drawInfo();
  }
  async function drawInfo() {
    info.replaceChildren();
    if (f.unlisted || !f.materials.length) return;
    const d = el('details', { class: 'info' }, el('summary', { text: 'Milestones and sources' }));
    info.append(d);
    d.addEventListener('toggle', async () => {
      if (!d.open || d.dataset.loaded) return;
      d.dataset.loaded = '1';
      for (const name of f.materials) {
        const resp = await fetch(`/api/groups?name=${encodeURIComponent(name)}`);
        if (!resp.ok) { d.append(el('p', { class: 'error', text: await resp.text() })); continue; }
        const g = await resp.json();
        if (g.kind !== 'material') d.append(el('p', { text: `${name}: a ${g.kind}, read as any of ${g.members.length} materials.` }));
        for (const m of g.members) d.append(milestoneTable(m));
      }
    });
  }
  drawChips();
  const lab = el('label', { for: id, text: 'Material (several: one of them)' });
  return el('div', { class: 'field wide' }, lab, chips, el('div', { class: 'combo' }, input, list), info);
}

function milestoneTable(m) {
  const t = el('table', {}, el('caption', { text: `${m.name} (${m.class}, ${m.origin})` }),
    el('thead', {}, el('tr', {}, ...['Milestone', 'Date', 'Place', 'Source'].map((h) => el('th', { scope: 'col', text: h })))));
  const body = el('tbody');
  for (const ms of m.milestones || []) {
    body.append(el('tr', {}, el('td', { text: ms.kind }), el('td', { text: ms.date }), el('td', { text: ms.place || 'anywhere' }),
      el('td', { text: `${ms.cite || ms.source} [${ms.basis}]${ms.object ? `; ${ms.object}` : ''}${ms.note ? `; ${ms.note}` : ''}` })));
  }
  t.append(body);
  return t;
}

function recordsSection() {
  const fs = el('fieldset', { 'data-path': 'records' }, el('legend', { text: 'Records (documented dates)' }));
  model.records.forEach((r, i) => {
    fs.append(el('div', { class: 'card', 'data-path': `records.${i}` },
      el('h3', {}, `Record ${i + 1}${r.id ? `: ${r.id}` : ''}`, tools(model.records, i, `record ${i + 1}`, () => rerenderSection('records'))),
      el('div', { class: 'row' },
        field('Id', r, 'id', `records.${i}.id`),
        select('Event', r, 'event', `records.${i}.event`, eventOptions()),
        select('The event is', r, 'kind', `records.${i}.kind`, RECORD_KINDS, { onchange: () => rerenderSection('records', `[data-path="records.${i}.${r.kind}"]`) }),
        field('Date (e.g. 1902, c. 1870, 1850/1860)', r, 'date', `records.${i}.${r.kind}`),
        select('Strength', r, 'strength', `records.${i}.strength`, [['', 'firm (default)'], ['hard', 'hard'], ['soft', 'soft']]),
        select('Calendar', r, 'calendar', `records.${i}.calendar`, CALENDAR_OPTIONS),
        select('Year starts on', r, 'year_start', `records.${i}.year_start`, YEAR_START_OPTIONS),
        field('Source', r, 'source', `records.${i}.source`, { wide: true }),
        field('Note', r, 'note', `records.${i}.note`, { wide: true }))));
  });
  fs.append(el('button', { type: 'button', class: 'add', onclick: () => {
    model.records.push({ id: `r-${model.records.length + 1}`, event: '', kind: 'not_after', date: '', strength: '', source: '', note: '', calendar: '', year_start: '', extra: {} });
    rerenderSection('records', `[data-path="records.${model.records.length - 1}.not_after"]`); changed();
  } }, 'Add a record'));
  return fs;
}

function claimsSection() {
  const fs = el('fieldset', { 'data-path': 'claims' }, el('legend', { text: 'Claims (dates to judge)' }));
  model.claims.forEach((c, i) => {
    fs.append(el('div', { class: 'card', 'data-path': `claims.${i}` },
      el('h3', {}, `Claim ${i + 1}${c.id ? `: ${c.id}` : ''}`, tools(model.claims, i, `claim ${i + 1}`, () => rerenderSection('claims'))),
      el('div', { class: 'row' },
        field('Id', c, 'id', `claims.${i}.id`),
        select('Event', c, 'event', `claims.${i}.event`, eventOptions()),
        field('Date (e.g. 1847, c. 1870, 1200 BCE)', c, 'date', `claims.${i}.date`),
        field('By', c, 'by', `claims.${i}.by`, { placeholder: 'e.g. the inscription' }),
        select('Calendar', c, 'calendar', `claims.${i}.calendar`, CALENDAR_OPTIONS),
        select('Year starts on', c, 'year_start', `claims.${i}.year_start`, YEAR_START_OPTIONS))));
  });
  fs.append(el('button', { type: 'button', class: 'add', onclick: () => {
    model.claims.push({ id: `c-${model.claims.length + 1}`, event: '', date: '', by: '', calendar: '', year_start: '', extra: {} });
    rerenderSection('claims', `[data-path="claims.${model.claims.length - 1}.date"]`); changed();
  } }, 'Add a claim'));
  return fs;
}

// ---- the materials browser ------------------------------------------------

let matTimer = null;
function browse() {
  clearTimeout(matTimer);
  matTimer = setTimeout(async () => {
    const p = new URLSearchParams();
    for (const [k, sel] of [['q', '#mat-q'], ['class', '#mat-class'], ['origin', '#mat-origin'], ['place', '#mat-place'], ['from', '#mat-from'], ['to', '#mat-to']]) {
      const v = $(sel).value.trim();
      if (v) p.set(k, v);
    }
    const list = await (await fetch(`/api/materials?${p}`)).json();
    $('#mat-count').textContent = `${list.length} material${list.length === 1 ? '' : 's'}.`;
    $('#mat-table tbody').replaceChildren(...list.map((m) => el('tr', {},
      el('td', {}, el('button', { type: 'button', onclick: (ev) => showMaterial(m.id, ev.target.closest('tr')) }, m.name)),
      el('td', { text: m.class }), el('td', { text: m.origin }), el('td', { text: m.made || '' }))));
  }, 150);
}

async function showMaterial(id, row) {
  for (const r of document.querySelectorAll('#mat-table tr[aria-selected]')) r.removeAttribute('aria-selected');
  if (row) row.setAttribute('aria-selected', 'true');
  const m = await (await fetch(`/api/materials/${encodeURIComponent(id)}`)).json();
  const d = $('#mat-detail');
  d.replaceChildren(...[el('h3', { text: m.name }),
    el('p', { text: [`${m.class}, ${m.origin}`, m.colour_index, m.cas && `CAS ${m.cas}`, m.formula].filter(Boolean).join(' · ') }),
    el('p', { text: `Also called: ${m.names.join(', ')}` }),
    m.markers ? el('p', { text: `Markers: ${m.markers.join(', ')}` }) : null,
    m.families ? el('p', { text: `Families: ${m.families.join(', ')}` }) : null,
    m.note ? el('p', { text: m.note }) : null,
    milestoneTable(m)].filter(Boolean));
  d.focus();
}

// ---- start ------------------------------------------------------------------

function showView(name) {
  $('#view-case').hidden = name !== 'case';
  $('#view-materials').hidden = name !== 'materials';
  $('#tab-case').setAttribute('aria-pressed', String(name === 'case'));
  $('#tab-materials').setAttribute('aria-pressed', String(name === 'materials'));
  if (name === 'materials' && !$('#mat-table tbody').children.length) browse();
}

async function start() {
  $('#tab-case').addEventListener('click', () => showView('case'));
  $('#tab-materials').addEventListener('click', () => showView('materials'));
  $('#new-blank').addEventListener('click', () => { model = blank(); render(); $('#results').replaceChildren(); runCheck(); });
  $('#example-select').addEventListener('change', async (ev) => {
    if (ev.target.value) await loadCase(await fetch(`/api/examples/${encodeURIComponent(ev.target.value)}`));
  });
  $('#upload').addEventListener('change', async (ev) => {
    const file = ev.target.files[0];
    if (file) await loadCase(await post(`/api/upload?name=${encodeURIComponent(file.name)}`, await file.arrayBuffer(), 'application/octet-stream'));
  });
  for (const b of document.querySelectorAll('[data-export]')) b.addEventListener('click', () => download(b.dataset.export));
  $('#editor').addEventListener('submit', (ev) => ev.preventDefault());
  $('#mat-filters').addEventListener('input', browse);
  $('#mat-filters').addEventListener('submit', (ev) => ev.preventDefault());
  const [examples, places, filters] = await Promise.all(['/api/examples', '/api/places', '/api/filters'].map(async (u) => (await fetch(u)).json()));
  for (const e of examples) $('#example-select').append(el('option', { value: e.name, text: e.title || e.name }));
  $('#places').replaceChildren(...places.map((p) => el('option', { value: p.code, text: `${p.name} (${p.code})` })));
  for (const c of filters.classes) $('#mat-class').append(el('option', { value: c, text: c }));
  for (const o of filters.origins) $('#mat-origin').append(el('option', { value: o, text: o }));
  render();
}

start();
