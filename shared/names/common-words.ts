/**
 * Everyday English words the name matcher refuses to read as a misspelt cultivar name: a window
 * made only of these words (say "copper wire") is ordinary speech, not a mishearing of an
 * invented 'Copper Wren'. A hand-written list (common practice, no published frequency list
 * used): function words, frequent verbs and nouns, and the vocabulary of garden tour narration.
 */

/** Words that never start or end a name found by fuzzy matching unless the name has them there. */
export const FUNCTION_WORDS: ReadonlySet<string> = new Set(
  `a an the and or but nor so yet if of to in on at by for with from into onto upon over under
  about after before between through during without within is are was were be been being am
  it its it's this that these those there here i you he she we they me him her us them my your
  his our their what which who whom whose when where why how not no yes do does did done has have
  had will would can could shall should may might must just also very too than then as up out
  off down oh ok okay well now all any some each every both either neither`.split(/\s+/),
);

const EVERYDAY = `
  about above across actually add after again against ago ahead air all almost alone along
  already alright also although always among amount and angle animal another answer any anyone
  anything anyway apart appear apple april area arm around arrive art ask asked august autumn
  away baby back bad bag ball bank bare bark base basket be bear beautiful beauty became because
  become bed been before began begin behind being believe bell below bend bent beside best better
  between big bird bit black blade blaze blend block bloom blossom blow blue board boat body bold
  bone book border both bottom bough bought bowl box branch branches brave bread break bright
  bring broad broke broken brother brown brush bud buds build built buried burn bury bush busy
  but buy by call called calm came can canopy car care careful carry case cast cat catch caught
  cause centre center chain chair chance change cheap check child children choose chose circle
  city class clean clear climb close closer cloud club coat cold collection colour color colours
  colors come comes coming compact compare cone container cool copper corner could count country
  couple course cover covered crimson cross crown cup cut cutting dark date daughter day days dead
  deal dear deep deeper delicate did different dig direction dirt do does dog done door double
  down dozen draw drawn dream drive drop dry dust dwarf each ear early earth east easy eat edge
  eight either else end enough even evening ever every everyone everything exactly example eye
  eyes face fact fade fall family far farm fast father favourite favorite feather feed feel feet
  fell felt fence few field fifteen fifth fifty fill film final find fine finger fire first fish
  five flat flower flowers fly fold follow food foot for force forest form forward found four
  frame free fresh friday friend friends from front frost fruit full fun garden gardens gate gave
  get gets getting gift girl give given glad glass glow go goes going gold golden gone good got
  gravel great green grew ground group grow growing grown growth guess had hair half hall hand
  hands hang happen happy hard has have he head hear heard heart heat heavy held hello help her
  here high hill him his hit hold hole home hope horse hot hour house how however huge hundred
  idea if important in inch inches inside instead interest into is island it its just keep kept
  kind king knew know known lace lady land large last late later lay lead leaf lean learn least
  leave leaves left leg less let letter level lie life light like likes line list listen little
  live long look looking looks lose lost lot lots loud love low made main make many map march
  mark matter may maybe me mean measure meet metre meter middle might mile mind minute miss
  moment monday money month moon more morning most mother mountain move much music must my name
  narrow near neck need needle needs neighbour neighbor never new next nice night nine no noon
  north nose not note nothing notice now number oak of off often oil old on once one only open
  or orange order other our out outside over own page pair paint paper part past path pattern
  pay people perhaps person pick picture piece pine pink place plain plan plant planted plants
  play please plenty point pond poor pot pots pretty probably problem pull purple push put quick
  quiet quite rain raise ran rather reach read ready real really reason red remember rest right
  ring rise river road rock roof room root roots rose round row rule run said same sat saturday
  saw say says school sea season second see seed seeds seem seen sell send sense set seven shade
  shadow shall shape she shed shine short should show shown shrub side sign silver simple since
  sing sir sister sit six size sky sleep slope slow small smell snow so soft soil some someone
  something sometimes son song soon sort sound south space speak special spot spread spring
  square stand star start stay stem stems step stick still stone stood stop story straight
  strange stream street strong such summer sun sunday sunny sure surface sweet table tail take
  taken talk tall tell ten than thank that the their them then there these they thick thin thing
  things think third this those though thought thousand three through thursday tie time tiny
  tip to today together told tomorrow too took top touch toward towards town tree trees tried
  trip true try tuesday turn turned twelve twenty twice two under until up upon upper us use used
  usually valley very view visit wait walk wall want warm was watch water wave way we wear
  weather wednesday week weeks weigh weight well went were west wet what wheel when where which
  while white who whole why wide wild will win wind window wing winter wire wish with within
  without woman wonder wood wooden word work world would write wrong yard year years yellow yes
  yesterday yet you young your
  afternoon along alright basically beds border bright brilliant buy canes colourful cultivar
  cultivars decent deeply dissectum drought dwarfs evergreen fertiliser fertilizer foliage gorgeous
  grafted graft hardy hedge hedges label labels lawn lovely maple maples mulch nursery palmatum
  pruning prune pruned repot repotted shelter sunlight specimen stunning sunset trunk twig twigs
  upright variegated weeping wind winds`;

/** Everyday English words plus the function words, lower-case. */
export const COMMON_WORDS: ReadonlySet<string> = new Set([
  ...FUNCTION_WORDS,
  ...EVERYDAY.split(/\s+/).filter((w) => w.length > 0),
]);
