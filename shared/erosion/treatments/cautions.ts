// The usual cautions shown beside a treatment where the work can hurt someone or something:
// earthwork, drainage, spreading lime or gypsum, digging. Plain words; local rules win.
export const CAUTIONS = {
  earthwork:
    'Earthwork needs a design to local standards by a qualified person (an engineer or the local conservation office); follow local codes and permits.',
  utilities: 'Check for buried utilities before any digging (call the local one-call service).',
  drainage:
    'Drainage needs a design to local standards by a qualified person, with a safe outlet; local codes and permits may apply to where the water goes.',
  dust: 'Wear dust protection (mask, eye protection) when handling or spreading lime or gypsum; keep children and animals away while spreading.',
  label: "Follow the product's label for handling, rate and timing.",
  nutrients: "Check the compost's nutrients against the field's nutrient budget (NRCS practice 590) before spreading.",
  sizing: 'The sizes here are planning estimates, not a design.',
} as const;
