// Bay editor helpers: tick a whole row, column or the whole level from its heading; when bays are ticked, say what
// they hold and start the form from the values they agree on (a field they differ on is left empty, marked
// "varies"). The form works without this script.
(function () {
  var grid = document.getElementById('bay-grid');
  if (!grid) return;
  var summary = document.getElementById('selection-summary');
  var boxes = function (pick) {
    var sel = pick === 'all' ? 'td input' : 'td.' + pick + ' input';
    return Array.prototype.slice.call(grid.querySelectorAll(sel));
  };
  grid.addEventListener('click', function (e) {
    var pick = e.target.getAttribute('data-pick');
    if (!pick) return;
    var list = boxes(pick);
    var allOn = list.every(function (b) { return b.checked; });
    list.forEach(function (b) { b.checked = !allOn; });
    fillFromTicked();
  });
  grid.addEventListener('change', fillFromTicked);

  var fields = { occupancy: 'occupancy', deadLoad: 'deadLoad', beams: 'beams', infillBeams: 'infillBeams',
    cantileversNorth: 'cantilevers.north', cantileversSouth: 'cantilevers.south',
    cantileversEast: 'cantilevers.east', cantileversWest: 'cantilevers.west',
    cantileverOccupancy: 'cantileverOccupancy' };

  function describe(on) {
    var counts = {};
    on.forEach(function (b) {
      var what = b.dataset.label || 'not framed';
      counts[what] = (counts[what] || 0) + 1;
    });
    return on.length + (on.length === 1 ? ' bay' : ' bays') + ' ticked: ' + Object.keys(counts).map(function (k) {
      return k + ' × ' + counts[k];
    }).join(', ') + '.';
  }

  function fillFromTicked() {
    var on = boxes('all').filter(function (b) { return b.checked; });
    if (summary) summary.textContent = on.length ? describe(on) : '';
    var framed = on.filter(function (b) { return b.dataset.occupancy; });
    if (!framed.length) return;
    var differ = [];
    Object.keys(fields).forEach(function (k) {
      var input = document.getElementById(fields[k]);
      if (!input) return;
      var first = framed[0].dataset[k] || '';
      var agree = framed.every(function (b) { return (b.dataset[k] || '') === first; });
      input.value = agree ? first : '';
      if (input.tagName === 'INPUT') input.placeholder = agree ? '' : 'varies';
      if (!agree) differ.push(input.labels && input.labels.length ? input.labels[0].textContent : fields[k]);
    });
    if (summary && differ.length) summary.textContent += ' They differ in: ' + differ.join('; ') + ' (left empty: give a value).';
    else if (summary && framed.length > 1) summary.textContent += ' They agree on every field: the form shows their values.';
  }
})();
