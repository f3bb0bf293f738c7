// The check queue: one button ticks every sheet the filters list (a whole level, say), or clears them all once
// they are all ticked. Without script the button stays hidden and each sheet is ticked on its own.
(function () {
  var button = document.getElementById('tick-all');
  if (!button) return;
  button.hidden = false;
  button.addEventListener('click', function () {
    var boxes = Array.prototype.slice.call(document.querySelectorAll('#queue input[name=sheet]'));
    var all = boxes.every(function (b) { return b.checked; });
    boxes.forEach(function (b) { b.checked = !all; });
  });
})();
