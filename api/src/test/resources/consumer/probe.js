// Measures a loaded page and writes the findings into the DOM, for a test to read from --dump-dom:
// errors reported to the page, every <math> element's laid-out size, elements reaching beyond the
// viewport, each SVG's size, longest path, texts (legend, axes) and figure caption, resources fetched.
(function () {
  const width = document.documentElement.clientWidth;
  const findings = {
    errors: window.__probeErrors || [], maths: 0, emptyMaths: [], wide: [], svgs: [], resources: 0,
    width: width, scrollWidth: document.documentElement.scrollWidth, height: document.documentElement.scrollHeight
  };
  document.querySelectorAll('math').forEach(function (m, i) {
    findings.maths++;
    const r = m.getBoundingClientRect();
    if (!(r.width > 0 && r.height > 0)) { findings.emptyMaths.push(i); }
  });
  document.querySelectorAll('body *').forEach(function (e) {
    const r = e.getBoundingClientRect();
    if (r.width > 0 && (r.right > width + 1 || r.left < -1)) {
      findings.wide.push(e.tagName + (e.id ? '#' + e.id : '') + ' ' + Math.round(r.left) + '..' + Math.round(r.right));
    }
  });
  document.querySelectorAll('svg').forEach(function (s) {
    let segments = 0;
    s.querySelectorAll('path').forEach(function (p) {
      segments = Math.max(segments, (p.getAttribute('d') || '').split(/[LM]/).length - 1);
    });
    const r = s.getBoundingClientRect();
    const figure = s.closest('figure');
    const caption = figure ? figure.querySelector('figcaption') : null;
    findings.svgs.push({ id: s.id, segments: segments, lines: s.querySelectorAll('line').length,
      shapes: s.querySelectorAll('rect,circle,ellipse').length, paths: s.querySelectorAll('path').length, width: r.width, height: r.height,
      texts: Array.prototype.map.call(s.querySelectorAll('text'), function (t) { return t.textContent; }),
      caption: caption ? caption.textContent : '' });
  });
  findings.resources = performance.getEntriesByType('resource').length;
  const out = document.createElement('script');
  out.type = 'application/json';
  out.id = 'probe-findings';
  out.textContent = JSON.stringify(findings);
  document.body.appendChild(out);
})();
