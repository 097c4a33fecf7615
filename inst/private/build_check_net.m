## -*- texinfo -*-
## @deftypefn {} {} build_check_net (@var{fn}, @var{net})
## Check that @var{net} is a network struct made by vn_network.
## @end deftypefn

function build_check_net (fn, net)
  if (! (isstruct (net) && isscalar (net) && isfield (net, "type")
         && ischar (net.type) && strcmp (net.type, "vesselnet.network")
         && isfield (net, "units") && isfield (net, "index")))
    build_error (fn, "", "NET must be a network made by vn_network, got %s",
                 build_value_str (net));
  endif
endfunction
