// Bay editor helpers: tick a whole row, column or the whole level from its heading, and when exactly one
// framed bay is ticked, start the form from that bay's values. The form works without this script.
(function () {
  var grid = document.getElementById('bay-grid');
  if (!grid) return;
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
    fillFromSingle();
  });
  grid.addEventListener('change', fillFromSingle);

  var fields = { occupancy: 'occupancy', deadLoad: 'deadLoad', beams: 'beams', infillBeams: 'infillBeams',
    cantileversNorth: 'cantilevers.north', cantileversSouth: 'cantilevers.south',
    cantileversEast: 'cantilevers.east', cantileversWest: 'cantilevers.west',
    cantileverOccupancy: 'cantileverOccupancy' };

  function fillFromSingle() {
    var on = boxes('all').filter(function (b) { return b.checked; });
    if (on.length !== 1 || !on[0].dataset.occupancy) return;
    Object.keys(fields).forEach(function (k) {
      var input = document.getElementById(fields[k]);
      if (input) input.value = on[0].dataset[k] || '';
    });
  }
})();
