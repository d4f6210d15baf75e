import type { AreaDef } from '../../../framework/types';

export const area: AreaDef = {
	code: 'MLR',
	name: 'Maintenance and light repair',
	tasks: [
		{
			code: 'MLR-01',
			title: 'Change the engine oil and filter',
			description:
				'Drain the engine oil, replace the filter and drain plug seal, refill with the specified oil to the correct level and reset the service reminder.',
			tier: 1,
			requiredLevel: 4,
			minHours: 3,
			checklist: [
				{ text: 'Looks up the oil specification, viscosity, capacity and drain plug torque' },
				{ text: 'Raises and supports the vehicle securely', safety: true },
				{ text: 'Removes the drain plug and drains the oil into a pan, keeping clear of hot oil' },
				{ text: 'Removes the filter and checks the old gasket came off with it', safety: true },
				{ text: 'Oils the new filter gasket and tightens the filter as specified' },
				{
					text: 'Fits the drain plug with a new seal and torques it to specification',
					safety: true
				},
				{
					text: 'Fills with the specified oil, runs the engine and checks for leaks and oil pressure warning',
					safety: true
				},
				{
					text: 'Rechecks the level on level ground, resets the service reminder and records the service'
				}
			],
			specs: [
				{ label: 'Oil capacity with filter', value: 4.7, unit: 'L', limit: 'nominal' },
				{ label: 'Oil drain plug torque', value: 30, unit: 'N·m', limit: 'nominal' },
				{
					label: 'Oil volume between the low and full dipstick marks',
					value: 1,
					unit: 'L',
					limit: 'nominal'
				}
			],
			tools: [
				'Drain pan',
				'Filter wrench',
				'Torque wrench',
				'Funnel',
				'Scan tool or reset procedure'
			],
			cautions: [
				'Hot oil can scald; let it cool or keep skin away from the stream.',
				'Used oil can irritate skin; wear nitrile gloves.',
				'Never work under the vehicle unless it is on locks or stands.'
			],
			serviceInfo: ['specifications', 'maintenance schedule', 'owner information'],
			questions: [
				{
					prompt: 'Why must you check that the old filter gasket came off with the filter?',
					options: [
						{ text: 'The old gasket can be reused to save cost', correct: false },
						{ text: 'It changes the oil capacity', correct: false },
						{
							text: 'A stuck old gasket under the new one leaks and can pump the engine dry within minutes',
							correct: true
						}
					],
					explanation:
						'Two gaskets will not seal, and the oil pump can lose most of the oil quickly once the engine runs.'
				},
				{
					prompt: 'Why is the new filter gasket smeared with clean oil before fitting?',
					options: [
						{
							text: 'So it seats evenly without twisting or tearing and can be removed later',
							correct: true
						},
						{ text: 'To prime the filter with oil', correct: false },
						{ text: 'It is not necessary with modern filters', correct: false }
					],
					explanation:
						'A dry rubber gasket drags on the mounting face and may distort, so a thin film of oil lets it seal properly.'
				},
				{
					prompt: 'What is the risk of over-tightening the drain plug?',
					options: [
						{ text: 'Lower oil consumption', correct: false },
						{ text: 'Stripped threads in the oil pan', correct: true },
						{ text: 'Higher oil pressure', correct: false }
					],
					explanation:
						'Oil pans are often aluminium or thin steel, so too much torque strips the thread and causes a leak.'
				},
				{
					prompt: 'The dipstick reads above the full mark after the service. What do you do?',
					options: [
						{ text: 'Leave it; extra oil gives extra protection', correct: false },
						{ text: 'Run the engine at high speed to burn off the excess', correct: false },
						{ text: 'Drain oil until the level is between the marks', correct: true }
					],
					explanation:
						'Overfilling can let the crankshaft whip the oil into foam, reducing lubrication and pushing oil past seals.'
				},
				{
					prompt: 'Where do you find which oil viscosity and specification the engine needs?',
					options: [
						{
							text: 'In the service information or owner information for that vehicle',
							correct: true
						},
						{ text: 'Use whatever the shop has in bulk', correct: false },
						{ text: 'It is printed on the drain plug', correct: false }
					],
					explanation:
						'Many modern engines need a particular viscosity and approval for their timing and emission systems to work as designed.'
				}
			]
		},
		{
			code: 'MLR-02',
			title: 'Rotate the tyres and set inflation pressures',
			description:
				'Inspect the tyres, move them in the pattern that suits the vehicle and tyre type, torque the wheel nuts in a star pattern and set cold pressures from the placard.',
			tier: 1,
			requiredLevel: 4,
			minHours: 2,
			checklist: [
				{
					text: 'Looks up the rotation pattern and whether the tyres are directional or sized differently front and rear'
				},
				{ text: 'Measures tread depth and notes uneven wear or damage on each tyre' },
				{ text: 'Raises and supports the vehicle securely', safety: true },
				{
					text: 'Moves the wheels to their new positions and cleans the hub and wheel contact faces'
				},
				{ text: 'Runs the nuts down by hand and snugs them in a star pattern', safety: true },
				{
					text: 'Lowers the vehicle and torques the nuts to specification in a star pattern',
					safety: true
				},
				{
					text: 'Sets cold pressures to the door placard, not the tyre sidewall maximum',
					safety: true
				},
				{ text: 'Completes the tyre pressure monitor relearn if the vehicle needs one' }
			],
			specs: [
				{ label: 'Wheel nut torque', value: 110, unit: 'N·m', limit: 'nominal' },
				{
					label: 'Cold tyre pressure (typical placard value)',
					value: 240,
					unit: 'kPa',
					limit: 'nominal'
				},
				{ label: 'Tread depth', value: 1.6, unit: 'mm', limit: 'minimum' }
			],
			tools: [
				'Lift or jack and stands',
				'Impact wrench with impact sockets',
				'Torque wrench',
				'Tyre pressure gauge',
				'Tread depth gauge',
				'Tyre pressure monitor tool'
			],
			cautions: [
				'A wheel with loose or over-tightened nuts can come off while driving.',
				'Check that the vehicle is secure before removing wheels.'
			],
			serviceInfo: ['maintenance schedule', 'specifications', 'owner information'],
			questions: [
				{
					prompt: 'Why are wheel nuts tightened in a star pattern?',
					options: [
						{ text: 'To balance the wheel', correct: false },
						{ text: 'To pull the wheel evenly against the hub so it sits flat', correct: true },
						{ text: 'Because it is quicker than going round in a circle', correct: false }
					],
					explanation:
						'Tightening one side first can cock the wheel, distort the rotor and leave nuts at uneven clamp load.'
				},
				{
					prompt: 'Where do you find the correct cold tyre pressure?',
					options: [
						{ text: 'The maximum pressure on the tyre sidewall', correct: false },
						{ text: 'Whatever pressure gives the softest ride', correct: false },
						{ text: 'On the vehicle placard, usually on the driver door jamb', correct: true }
					],
					explanation:
						'The placard is set for the vehicle load and handling; the sidewall figure is only the tyre limit.'
				},
				{
					prompt: 'How are directional tyres rotated?',
					options: [
						{ text: 'Front to rear on the same side only', correct: true },
						{ text: 'Crossed side to side so they wear evenly', correct: false },
						{ text: 'Directional tyres are never rotated', correct: false }
					],
					explanation:
						'Crossing sides would make a directional tyre turn backwards against its tread design.'
				},
				{
					prompt:
						'A front tyre is worn much more on its inner edge than the rest. What does it most likely suggest?',
					options: [
						{ text: 'Normal wear for a front tyre', correct: false },
						{ text: 'A wheel alignment problem that should be reported', correct: true },
						{ text: 'Overinflation', correct: false }
					],
					explanation:
						'Wear on one edge points to camber or toe settings, which rotation hides but does not fix.'
				},
				{
					prompt: 'You set the pressures just after a long road test. What is the problem?',
					options: [
						{ text: 'There is no problem; hot pressure is the real pressure', correct: false },
						{ text: 'Hot tyres read low, so they will be over-inflated', correct: false },
						{
							text: 'Hot tyres read high, so they will be under-inflated once they cool',
							correct: true
						}
					],
					explanation:
						'Placard pressures are cold pressures, because air pressure rises as the tyre warms.'
				},
				{
					prompt:
						'Why is the final torque applied with a torque wrench after the wheels are on the ground?',
					options: [
						{
							text: 'The wheel cannot turn while you pull, and the torque wrench gives the specified clamp load',
							correct: true
						},
						{ text: 'The impact wrench gives too little torque on the lift', correct: false },
						{ text: 'The wheel weight centres it on the studs', correct: false }
					],
					explanation:
						'With the tyre on the floor the wheel stays still, so a calibrated wrench can reach the exact value.'
				}
			]
		},
		{
			code: 'MLR-03',
			title: 'Balance a wheel and tyre assembly',
			description:
				'Mount a wheel on a balancer with the correct centring, apply weights where indicated and check for runout when a vibration remains.',
			tier: 2,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{ text: 'Removes old weights, stones and mud, and checks the tyre pressure' },
				{ text: 'Mounts the wheel with the right cone or adapter so it is centred on its bore' },
				{ text: 'Enters the wheel dimensions and weight type' },
				{ text: 'Spins the wheel with the guard down', safety: true },
				{ text: 'Fits weights at the indicated positions and re-spins to confirm' },
				{ text: 'Measures radial runout when a vibration complaint remains' }
			],
			specs: [{ label: 'Tyre and wheel radial runout', value: 1.5, unit: 'mm', limit: 'maximum' }],
			tools: ['Wheel balancer', 'Centring cones and adapters', 'Weight pliers', 'Dial indicator'],
			cautions: [
				'Keep the guard down and hands clear while the wheel spins.',
				'Stones in the tread can be thrown out at speed.'
			],
			serviceInfo: ['specifications'],
			questions: [
				{
					prompt: 'Why must the wheel be centred on its bore with the correct cone?',
					options: [
						{ text: 'It reduces wear on the balancer shaft only', correct: false },
						{
							text: 'Off-centre mounting gives false readings, so the wheel is still out of balance on the car',
							correct: true
						},
						{ text: 'The balancer will not spin without a cone', correct: false }
					],
					explanation:
						'The balancer measures about the centre it is given, which must match how the wheel sits on the hub.'
				},
				{
					prompt:
						'A wheel is balanced but the car still vibrates. What is a reasonable next check?',
					options: [
						{ text: 'Add more weight to the same wheel', correct: false },
						{ text: 'Raise the tyre pressure to the sidewall maximum', correct: false },
						{ text: 'Radial runout of the tyre and wheel', correct: true }
					],
					explanation:
						'An out-of-round tyre or wheel can shake the car even when perfectly balanced.'
				}
			]
		},
		{
			code: 'MLR-04',
			title: 'Check under-hood fluid levels and condition',
			description:
				'Check engine oil, coolant, brake, power steering, transmission where checkable and washer fluid levels and condition, and report anything that points to a leak or fault.',
			tier: 1,
			requiredLevel: 4,
			minHours: 1.5,
			checklist: [
				{ text: 'Parks on level ground and looks up the check method for each fluid' },
				{ text: 'Checks engine oil level and condition after the oil has drained back' },
				{
					text: 'Checks coolant level at the reservoir with the engine cold, without opening a hot cap',
					safety: true
				},
				{ text: 'Checks brake fluid level and colour at the reservoir' },
				{
					text: 'Checks power steering and transmission fluid where the design allows it, by the specified method'
				},
				{ text: 'Tops up washer fluid with a blend suited to the season' },
				{
					text: 'Uses only the specified fluid for any top-up and records findings on the repair order'
				}
			],
			specs: [
				{
					label: 'Oil volume between the low and full dipstick marks',
					value: 1,
					unit: 'L',
					limit: 'nominal'
				}
			],
			tools: ['Clean rags', 'Funnels', 'Flashlight'],
			cautions: [
				'Never open a hot radiator or reservoir cap; coolant can erupt and scald.',
				'Keep hands and rags away from the fan and belts; electric fans can start with the engine off.'
			],
			serviceInfo: ['specifications', 'owner information', 'maintenance schedule'],
			questions: [
				{
					prompt: 'Why is coolant checked with the engine cold?',
					options: [
						{
							text: 'The system is pressurised when hot and opening it can spray scalding coolant',
							correct: true
						},
						{ text: 'Coolant is invisible when hot', correct: false },
						{ text: 'The reservoir is empty when the engine is hot', correct: false }
					],
					explanation:
						'Hot coolant under pressure boils violently when the cap is opened; the cold mark is the reference for the level.'
				},
				{
					prompt:
						'The brake fluid level has dropped slowly to near the minimum mark. What are the two likely reasons? (Choose two.)',
					options: [
						{
							text: 'The brake pads have worn, so the caliper pistons hold more fluid',
							correct: true
						},
						{ text: 'There is a leak in the brake system', correct: true },
						{ text: 'Brake fluid evaporates normally through the cap', correct: false },
						{ text: 'The fluid has expanded from cold', correct: false }
					],
					explanation:
						'The level falls as pads wear, but a leak can also cause it, so pads and lines are checked before any top-up.'
				},
				{
					prompt: 'Engine oil on the dipstick looks milky. What could it mean?',
					options: [
						{ text: 'The oil is new', correct: false },
						{ text: 'The oil is the wrong viscosity', correct: false },
						{
							text: 'Coolant is getting into the oil, for example through a failed head gasket',
							correct: true
						}
					],
					explanation:
						'A milky, creamy look is usually water or coolant mixed with oil and needs diagnosis before the engine is damaged.'
				},
				{
					prompt:
						'Why wait a few minutes after switching the engine off before reading the dipstick?',
					options: [
						{ text: 'So the oil drains back to the pan and the reading is true', correct: true },
						{ text: 'So the oil cools enough to show its colour', correct: false },
						{ text: 'So the oil pressure light goes out', correct: false }
					],
					explanation:
						'Oil still in the upper engine makes the level look low, which can lead to overfilling.'
				},
				{
					prompt: 'Why use only the specified fluid to top up a system?',
					options: [
						{ text: 'It only matters for warranty', correct: false },
						{
							text: 'Different fluids can be incompatible and damage seals or change how the system works',
							correct: true
						},
						{ text: 'Any fluid of the same colour is the same', correct: false }
					],
					explanation:
						'For example, mixing coolant types can reduce protection, and the wrong transmission fluid can cause harsh shifting.'
				}
			]
		},
		{
			code: 'MLR-05',
			title: 'Test and replace a 12 V battery and check the charging voltage',
			description:
				'Test the battery state of charge and condition, replace it when it fails, clean and torque the terminals, and check that the charging system holds the right voltage.',
			tier: 1,
			requiredLevel: 4,
			minHours: 2,
			checklist: [
				{ text: 'Inspects the case, terminals and hold-down and measures resting voltage' },
				{ text: 'Tests the battery with a conductance or load tester against its rating' },
				{
					text: 'Notes any radio codes or settings and uses a memory saver only as service information allows'
				},
				{
					text: 'Disconnects negative first, then positive, and removes the hold-down',
					safety: true
				},
				{
					text: 'Cleans the tray and cable ends and fits a battery of the specified type and rating'
				},
				{
					text: 'Connects positive first, then negative, torques the clamps and fits the hold-down',
					safety: true
				},
				{ text: 'Checks charging voltage at fast idle with loads on and off' },
				{ text: 'Completes any relearn procedures and records the results' }
			],
			specs: [
				{ label: 'Fully charged battery at rest', value: 12.6, unit: 'V', limit: 'nominal' },
				{
					label: 'Voltage during a load test at half the cold cranking rating',
					value: 9.6,
					unit: 'V',
					limit: 'minimum'
				},
				{ label: 'Cold cranking rating (typical)', value: 600, unit: 'A', limit: 'nominal' },
				{ label: 'Charging voltage at 2000 rpm', value: 13.5, unit: 'V', limit: 'minimum' },
				{ label: 'Charging voltage at 2000 rpm', value: 14.8, unit: 'V', limit: 'maximum' },
				{ label: 'Battery terminal clamp nut torque', value: 6, unit: 'N·m', limit: 'nominal' }
			],
			tools: [
				'Battery conductance tester',
				'Multimeter',
				'Terminal brush',
				'Battery carrier',
				'Memory saver',
				'Torque wrench'
			],
			cautions: [
				'Batteries contain acid and give off explosive gas; wear eye protection and avoid sparks.',
				'A wrench across the positive post and body will short the battery.',
				'Batteries are heavy; use a carrier and lift with your legs.'
			],
			serviceInfo: ['specifications', 'repair procedure', 'diagnostic procedure'],
			questions: [
				{
					prompt: 'A battery rests at 12.2 V. What should you do before testing it?',
					options: [
						{ text: 'Replace it immediately', correct: false },
						{ text: 'Nothing; test it as it is', correct: false },
						{
							text: 'Charge it, because it is only about half charged and the test would be misleading',
							correct: true
						}
					],
					explanation:
						'Most tests need a reasonably charged battery; a discharged but healthy battery can fail a load test.'
				},
				{
					prompt: 'Why is the negative cable disconnected first?',
					options: [
						{
							text: 'It removes the ground path, so a wrench touching the body while on the positive cannot short',
							correct: true
						},
						{ text: 'The negative cable is always shorter', correct: false },
						{ text: 'It keeps the radio memory', correct: false }
					],
					explanation:
						'Once ground is disconnected, the positive terminal has no path to the body through a tool.'
				},
				{
					prompt: 'Charging voltage at 2000 rpm reads 15.6 V. What does it show?',
					options: [
						{ text: 'A weak battery', correct: false },
						{
							text: 'Overcharging, which can damage the battery and electrical parts',
							correct: true
						},
						{ text: 'A strong, healthy alternator', correct: false }
					],
					explanation:
						'Above the maximum the regulator is not controlling the output, which boils batteries and stresses electronics.'
				},
				{
					prompt: 'Why must the battery hold-down always be refitted?',
					options: [
						{ text: 'It helps the battery charge', correct: false },
						{ text: 'It is only needed on rough roads', correct: false },
						{
							text: 'A loose battery can move, short against metal, crack the case or break terminals',
							correct: true
						}
					],
					explanation:
						'Vibration and braking forces can throw an unsecured battery against parts of the vehicle.'
				},
				{
					prompt: 'What should you enter in a conductance tester before testing?',
					options: [
						{
							text: 'The battery type and its rated cold cranking value from the label',
							correct: true
						},
						{ text: 'The engine size', correct: false },
						{ text: 'The odometer reading', correct: false }
					],
					explanation:
						'The tester compares what it measures against the rating, so the wrong rating gives the wrong verdict.'
				}
			]
		},
		{
			code: 'MLR-06',
			title: 'Replace wiper blades and exterior lamp bulbs',
			description:
				'Fit wiper blades of the right size and type and replace failed exterior bulbs, checking every lamp works afterwards.',
			tier: 3,
			requiredLevel: 3,
			minHours: 0.5,
			checklist: [
				{ text: 'Looks up blade lengths and bulb types for the vehicle' },
				{
					text: 'Lifts the wiper arm and protects the glass while changing the blade',
					safety: true
				},
				{ text: 'Fits the blade so it locks fully onto the arm' },
				{ text: 'Fits bulbs without touching the glass of halogen bulbs' },
				{ text: 'Checks all exterior lamps work, with a helper or a reflection' },
				{ text: 'Checks headlamp aim where a lamp unit has been disturbed' }
			],
			specs: [],
			tools: ['Trim tools', 'Clean gloves', 'Towel to protect the windshield'],
			cautions: [
				'A wiper arm that snaps back without a blade can crack the windshield.',
				'Lamps and bulbs can be hot; let them cool.'
			],
			serviceInfo: ['owner information', 'repair procedure'],
			questions: [
				{
					prompt: 'Why should the glass of a halogen bulb not be touched?',
					options: [
						{ text: 'It changes the colour of the light', correct: false },
						{
							text: 'Skin oil creates a hot spot that can make the bulb fail early',
							correct: true
						},
						{ text: 'It gives you a shock', correct: false }
					],
					explanation:
						'Halogen bulbs run very hot, and residue on the glass concentrates heat and weakens it.'
				},
				{
					prompt: 'Why place a towel on the windshield while the blade is off?',
					options: [
						{ text: 'To keep the glass clean for inspection', correct: false },
						{ text: 'To stop the wiper motor running', correct: false },
						{ text: 'The spring-loaded arm can snap back and crack the glass', correct: true }
					],
					explanation:
						'Wiper arms are under strong spring tension and the bare metal end can chip the glass.'
				}
			]
		},
		{
			code: 'MLR-07',
			title: 'Drain, refill and bleed the engine cooling system',
			description:
				'Drain the coolant from a cold engine, refill with the specified coolant mix, remove trapped air and check freeze protection and for leaks.',
			tier: 2,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{ text: 'Confirms the engine is cold before opening the system', safety: true },
				{ text: 'Looks up the coolant type, capacity and bleed procedure' },
				{ text: 'Drains the coolant into a clean pan and collects it for disposal' },
				{ text: 'Refills with the specified coolant at the specified mix' },
				{
					text: 'Opens bleed screws or uses a filling funnel and runs the engine until the thermostat opens'
				},
				{ text: 'Checks heater output, for leaks and the fan operation' },
				{ text: 'Checks freeze protection with a refractometer and sets the level when cold' }
			],
			specs: [
				{ label: 'Cooling system capacity', value: 6.5, unit: 'L', limit: 'nominal' },
				{ label: 'Coolant concentrate in the mix', value: 50, unit: '%', limit: 'nominal' },
				{ label: 'Freeze point of the mix', value: -37, unit: '°C', limit: 'maximum' }
			],
			tools: ['Spill-free filling funnel', 'Refractometer', 'Drain pan', 'Hose pliers'],
			cautions: [
				'Hot coolant under pressure can scald.',
				'Coolant is poisonous and tastes sweet; clean spills and store it closed.',
				'Keep clear of the fan while the engine runs.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'maintenance schedule'],
			questions: [
				{
					prompt: 'Why must air be bled from the cooling system after a refill?',
					options: [
						{
							text: 'Trapped air can cause hot spots, false temperature readings and overheating',
							correct: true
						},
						{ text: 'Air makes the coolant freeze sooner', correct: false },
						{ text: 'Air only affects the heater noise', correct: false }
					],
					explanation:
						'An air pocket at the sensor or in the head stops coolant reaching hot metal, which can crack a head.'
				},
				{
					prompt: 'Why not fill with pure coolant concentrate for extra protection?',
					options: [
						{ text: 'It is fine in cold climates', correct: false },
						{
							text: 'Undiluted concentrate transfers heat poorly and gives less freeze protection than the proper mix',
							correct: true
						},
						{ text: 'It is too expensive but otherwise better', correct: false }
					],
					explanation:
						'Water carries heat away far better, and the mix gives the lowest freeze point.'
				},
				{
					prompt:
						'The refractometer shows a freeze point of -20 °C against a specification of -37 °C. What does it mean?',
					options: [
						{ text: 'The coolant gives better protection than specified', correct: false },
						{ text: 'The refractometer needs zeroing only', correct: false },
						{ text: 'The mix is too weak and needs correcting', correct: true }
					],
					explanation:
						'The freeze point must be at or below the specification; a higher value means too little concentrate.'
				}
			]
		},
		{
			code: 'MLR-08',
			title: 'Check brake fluid level and test it for moisture',
			description:
				'Check the brake fluid level and condition, test its moisture content or boiling point and recommend a flush when it is out of specification.',
			tier: 1,
			requiredLevel: 4,
			minHours: 1,
			checklist: [
				{ text: 'Looks up the fluid grade marked on the reservoir cap or in service information' },
				{ text: 'Cleans the reservoir cap area before opening it' },
				{ text: 'Checks the level between the minimum and maximum marks and notes the pad wear' },
				{ text: 'Tests the fluid with a moisture tester or boiling point tester' },
				{ text: 'Tops up only with fresh fluid of the specified grade from a sealed container' },
				{ text: 'Closes the cap promptly and wipes spills off paint immediately' },
				{ text: 'Recommends a flush when the result is out of specification and records it' }
			],
			specs: [
				{ label: 'Moisture content of brake fluid', value: 3, unit: '%', limit: 'maximum' },
				{
					label: 'Wet boiling point of new glycol grade 3 fluid',
					value: 140,
					unit: '°C',
					limit: 'minimum'
				}
			],
			tools: ['Brake fluid moisture tester', 'Boiling point tester', 'Clean rags'],
			cautions: [
				'Brake fluid damages paint and irritates eyes; wear eye protection.',
				'Low or contaminated fluid can lead to brake failure.'
			],
			serviceInfo: ['specifications', 'maintenance schedule'],
			questions: [
				{
					prompt: 'Why does glycol-based brake fluid need changing over time?',
					options: [
						{
							text: 'It absorbs moisture, which lowers its boiling point and causes internal corrosion',
							correct: true
						},
						{ text: 'It thickens and blocks the lines', correct: false },
						{ text: 'It evaporates from the reservoir', correct: false }
					],
					explanation:
						'Water in the fluid can boil under hard braking, making vapour that gives a soft or sinking pedal.'
				},
				{
					prompt: 'Why is fresh brake fluid taken from a sealed container?',
					options: [
						{ text: 'Sealed containers are cheaper', correct: false },
						{ text: 'An opened container absorbs moisture from the air', correct: true },
						{ text: 'Opened fluid loses its colour', correct: false }
					],
					explanation:
						'Fluid left open on the shelf is already contaminated before it goes into the car.'
				},
				{
					prompt:
						'The pads are nearly worn out and the fluid is at the minimum mark. Should you top it up?',
					options: [
						{ text: 'Yes, to the maximum mark, every time', correct: false },
						{ text: 'Yes, with any fluid available', correct: false },
						{
							text: 'No; when new pads are fitted the pistons push fluid back and it would overflow, but check for leaks',
							correct: true
						}
					],
					explanation:
						'Fluid level tracks pad wear; topping up before a pad change causes an overflow of fluid that damages paint.'
				},
				{
					prompt: 'Why clean around the reservoir cap before opening it?',
					options: [
						{ text: 'Dirt falling into the fluid can damage seals and valves', correct: true },
						{ text: 'So the level marks are easier to read', correct: false },
						{ text: 'It is only cosmetic', correct: false }
					],
					explanation:
						'Debris in brake fluid can hold valves open or wear piston seals, which affects braking.'
				},
				{
					prompt: 'The moisture tester shows 4 %. What do you recommend?',
					options: [
						{ text: 'A top-up with fresh fluid to dilute the water', correct: false },
						{
							text: 'A brake fluid flush, because the moisture is above the maximum',
							correct: true
						},
						{ text: 'Nothing; 4 % is a safe amount', correct: false }
					],
					explanation:
						'Above the limit the boiling point has fallen too far, and only replacing the fluid removes the water.'
				}
			]
		},
		{
			code: 'MLR-09',
			title: 'Replace the engine air filter and cabin air filter',
			description:
				'Inspect and replace the engine air filter and the cabin air filter, sealing the housings correctly and fitting the cabin filter the right way round.',
			tier: 2,
			requiredLevel: 4,
			minHours: 0.5,
			checklist: [
				{ text: 'Looks up the filter locations and replacement intervals' },
				{
					text: 'Removes the engine air filter and cleans debris from the housing without letting it into the intake'
				},
				{ text: 'Fits the new filter so it seals all round and secures every clip' },
				{ text: 'Accesses the cabin filter and notes the airflow arrow' },
				{
					text: 'Fits the cabin filter with the arrow in the direction of airflow and refits the covers'
				},
				{ text: 'Checks the blower works on all speeds' }
			],
			specs: [],
			tools: ['Trim tools', 'Shop vacuum', 'Flashlight'],
			cautions: ['Wear a dust mask when handling very dirty filters or nests.'],
			serviceInfo: ['maintenance schedule', 'owner information'],
			questions: [
				{
					prompt: 'Why must the engine air filter housing seal all round?',
					options: [
						{ text: 'It keeps the filter from rattling', correct: false },
						{ text: 'It only matters on diesel engines', correct: false },
						{
							text: 'Unfiltered dust getting past the filter wears the engine, and air can bypass the airflow sensor',
							correct: true
						}
					],
					explanation: 'Dirt entering the intake acts as an abrasive on cylinders and rings.'
				},
				{
					prompt: 'Why not clean a paper engine air filter with compressed air and refit it?',
					options: [
						{ text: 'The air can tear the paper media and let dirt through', correct: true },
						{ text: 'It makes the filter too clean', correct: false },
						{ text: 'It is the recommended way to extend its life', correct: false }
					],
					explanation: 'Tiny tears are hard to see but let dust straight into the engine.'
				}
			]
		},
		{
			code: 'MLR-10',
			title: 'Inspect and replace a serpentine drive belt',
			description:
				'Inspect the accessory drive belt, tensioner and pulleys for wear and noise, and replace the belt on the correct routing with the tensioner working.',
			tier: 2,
			requiredLevel: 3,
			minHours: 1.5,
			checklist: [
				{ text: 'Switches the engine off and removes the key', safety: true },
				{ text: 'Checks the belt for cracks, chunks, glazing and rib wear with a wear gauge' },
				{ text: 'Finds the routing diagram or photographs the routing before removal' },
				{
					text: 'Releases the tensioner slowly with the proper tool and removes the belt',
					safety: true
				},
				{ text: 'Spins each idler and pulley by hand to check for roughness and wobble' },
				{ text: 'Fits the new belt on the correct routing, seated in every groove' },
				{
					text: 'Releases the tensioner slowly and runs the engine to check belt tracking and noise'
				}
			],
			specs: [
				{ label: 'Tensioner mounting bolt torque', value: 40, unit: 'N·m', limit: 'nominal' }
			],
			tools: ['Serpentine belt tensioner tool', 'Belt wear gauge', 'Flashlight'],
			cautions: [
				'Moving belts and fans can catch fingers, hair and clothing.',
				'A tensioner released suddenly can snap back and injure your hand.'
			],
			serviceInfo: ['repair procedure', 'maintenance schedule'],
			questions: [
				{
					prompt: 'A modern belt has no visible cracks. Can it still be worn out?',
					options: [
						{ text: 'Only if it squeals', correct: false },
						{ text: 'Yes; rib wear is measured with a wear gauge', correct: true },
						{ text: 'No; without cracks it is in good condition', correct: false }
					],
					explanation:
						'Modern belt materials wear thin without cracking, so the rib depth check is the reliable test.'
				},
				{
					prompt: 'Why spin each pulley by hand with the belt off?',
					options: [
						{ text: 'To prime the water pump', correct: false },
						{ text: 'To align the timing marks', correct: false },
						{ text: 'To find rough or noisy bearings and wobbly pulleys', correct: true }
					],
					explanation:
						'A failing bearing can destroy a new belt quickly, and it is easiest to feel with the belt removed.'
				}
			]
		},
		{
			code: 'MLR-11',
			title: 'Look up the maintenance schedule and carry out a multipoint inspection',
			description:
				'Find the service due for the vehicle from its mileage, age and operating conditions, inspect it against a multipoint list and record clear recommendations.',
			tier: 1,
			requiredLevel: 4,
			minHours: 2,
			checklist: [
				{ text: 'Records the VIN and odometer reading on the repair order' },
				{
					text: 'Looks up the maintenance schedule and asks about normal or severe operating conditions'
				},
				{ text: 'Checks for open service bulletins or recalls for the VIN' },
				{ text: 'Inspects tyres, brakes, fluids, belts, hoses, lamps, wipers and leaks as listed' },
				{
					text: 'Road-tests the vehicle or checks it as the shop procedure requires',
					safety: true
				},
				{
					text: 'Records findings with measurements and photos and ranks them by safety and urgency'
				}
			],
			specs: [],
			tools: [
				'Service information',
				'Tread depth gauge',
				'Tyre pressure gauge',
				'Flashlight',
				'Inspection form'
			],
			cautions: ['Raise and support the vehicle correctly before inspecting underneath.'],
			serviceInfo: ['maintenance schedule', 'service bulletin', 'owner information'],
			questions: [
				{
					prompt:
						'Which driving conditions usually call for the severe service schedule? (Choose two.)',
					options: [
						{ text: 'A car that is new', correct: false },
						{ text: 'Mostly short trips where the engine does not fully warm up', correct: true },
						{ text: 'Towing a trailer or driving on dusty roads', correct: true },
						{ text: 'Steady highway driving in mild weather', correct: false }
					],
					explanation:
						'Short trips, heavy loads, dust and extreme heat or cold wear oil, filters and fluids faster.'
				},
				{
					prompt: 'A schedule gives an interval in both distance and months. Which applies?',
					options: [
						{ text: 'Distance only', correct: false },
						{ text: 'Whichever comes first', correct: true },
						{ text: 'Whichever comes last', correct: false }
					],
					explanation: 'Fluids age even when a car is hardly driven, so time also counts.'
				},
				{
					prompt: 'Why check for service bulletins and recalls during a maintenance visit?',
					options: [
						{ text: 'They list the price of parts', correct: false },
						{ text: 'They replace the maintenance schedule', correct: false },
						{
							text: 'They describe known problems and fixes for that vehicle that may need to be done',
							correct: true
						}
					],
					explanation:
						'Bulletins and recalls can change a repair or require safety work, so the VIN is checked each visit.'
				},
				{
					prompt: 'How should findings be ranked on the recommendations?',
					options: [
						{
							text: 'Safety items first, then items that will cause damage if left, then maintenance due',
							correct: true
						},
						{ text: 'Most expensive first', correct: false },
						{ text: 'In the order you looked at them', correct: false }
					],
					explanation:
						'Clear priorities help the customer make decisions and make sure safety problems are not missed.'
				},
				{
					prompt:
						'Why record measurements such as tread depth and pad thickness, not just "good" or "bad"?',
					options: [
						{ text: 'Measurements are only needed for warranty claims', correct: false },
						{
							text: 'Numbers show how close a part is to its limit and can be compared at the next visit',
							correct: true
						},
						{ text: 'It makes the form longer', correct: false }
					],
					explanation: 'A measured value supports the recommendation and tracks wear over time.'
				}
			]
		},
		{
			code: 'MLR-12',
			title: 'Repair a tyre puncture with a plug-patch from inside the tyre',
			description:
				'Demount the tyre, decide whether the puncture is repairable, fit a combined plug and patch from the inside, remount, seat the beads safely and rebalance.',
			tier: 2,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{
					text: 'Marks the tyre position, deflates it and demounts it without damaging the pressure sensor'
				},
				{
					text: 'Inspects inside for damage from running flat and checks the injury is in the repairable tread area',
					safety: true
				},
				{
					text: 'Prepares the injury and the inner liner, then fits the plug-patch to the kit instructions'
				},
				{ text: 'Lubricates the beads and remounts the tyre' },
				{
					text: 'Seats the beads without exceeding the bead-seating pressure, in a cage or with the clip-on chuck',
					safety: true
				},
				{ text: 'Sets the placard pressure, rebalances and checks for leaks' }
			],
			specs: [
				{ label: 'Puncture diameter that can be repaired', value: 6, unit: 'mm', limit: 'maximum' },
				{ label: 'Bead-seating pressure', value: 40, unit: 'psi', limit: 'maximum' }
			],
			tools: [
				'Tyre changer',
				'Plug-patch repair kit',
				'Low-speed buffer',
				'Inflation cage',
				'Wheel balancer'
			],
			cautions: [
				'An over-pressurised tyre can burst and cause serious injury.',
				'A repair in the shoulder or sidewall can fail at speed.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why is a plug-only repair from the outside not accepted?',
					options: [
						{ text: 'Plugs are too expensive', correct: false },
						{ text: 'Plugs make the tyre out of balance', correct: false },
						{
							text: 'It does not seal the inner liner or let you inspect inside for hidden damage',
							correct: true
						}
					],
					explanation:
						'Only demounting shows damage from running flat, and the patch seals the liner so air cannot reach the casing.'
				},
				{
					prompt: 'A nail has gone through the shoulder near the sidewall. What do you do?',
					options: [
						{ text: 'Replace the tyre; the area cannot be repaired safely', correct: true },
						{ text: 'Plug and patch it as usual', correct: false },
						{ text: 'Fit a larger patch to cover the flexing area', correct: false }
					],
					explanation:
						'The shoulder and sidewall flex a lot, so repairs there can fail and cause a blow-out.'
				}
			]
		}
	]
};
