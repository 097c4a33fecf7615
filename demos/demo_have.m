## -*- texinfo -*-
## @deftypefn {} {@var{tf} =} demo_have (@var{name})
## True when command @var{name} can be called; otherwise say so.
##
## The demo uses it to go on without a command that is not installed
## yet, telling the reader which part it leaves out.
## @end deftypefn

function tf = demo_have (name)
  tf = any (exist (name) == [2 3 5]);
  if (! tf)
    printf ("(%s is not available here; that part of the demo is left out)\n",
            name);
  endif
endfunction
