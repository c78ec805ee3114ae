/** The API's own sentences in English (the shared engine's reasons have their own twins in shared). */
export const en = {
  invitations: {
    notOurs: 'This invitation link is not one we sent, or it was replaced by a newer one.',
    used: 'This invitation has already been used.',
    expired: 'This invitation has expired: ask the organiser to send a new one.',
    otherAddress: 'This invitation was sent to {{email}}: sign in with that address to accept it.',
    accountExists: 'An account already uses {{email}}: sign in first, then open the link again.',
    needNameAndPassword: 'To join, give your name and choose a password.',
    requiredForAccount: 'is required to make your account',
  },
  validation: {
    /** A 400's sentence listing each bad field and its reason ("name must be …; zip must be …"). */
    pleaseCheck: 'Please check: {{problems}}',
    notAField: 'is not a field this request accepts',
    utf16: 'is UTF-16 text: save it as "CSV UTF-8" and upload it again',
    notUtf8: 'is not UTF-8 text (another encoding, or not text): save it as "CSV UTF-8" and upload it again',
    fileRequired: 'is required',
    attachFile: 'Attach the file in the "{{field}}" field.',
    /** An uploaded GeoJSON file of ecoregion outlines (RFC 7946). */
    geojson: {
      notJson: 'is not valid JSON',
      notJsonSentence: 'The file is not valid JSON.',
      notCollection: 'must be a GeoJSON FeatureCollection',
      notCollectionSentence: 'Expected a GeoJSON FeatureCollection with features.',
      notRegionCode: '"{{code}}" is not an EPA Level III code (1–85)',
      required: 'is required',
      twice: '{{code}} appears twice',
      problems: 'The file has {{count}} problem(s); nothing was imported.',
      notPolygon: 'must be a Polygon or MultiPolygon',
      emptyCoordinates: 'must be a non-empty array',
      notRings: 'must be a polygon: a non-empty array of rings',
      shortRing: 'a ring needs at least 4 positions',
      notPosition: 'must be [longitude, latitude] in degrees (WGS84)',
      openRing: 'a ring must end where it starts',
    },
  },
  places: {
    unknownZipField: '{{zip}} is not a US ZIP code we know',
    unknownZip: '{{zip}} is not a US ZIP code we know. Check the five digits, or click the map where your ground is.',
    outsideField: 'is outside the 48 conterminous states and DC',
    outsideNamed:
      '{{place}} is outside the area Homeground covers. Homeground covers the 48 conterminous states and the District of Columbia, where the EPA maps its Level III ecoregions.',
    outsideUnnamed:
      'That place is outside the area Homeground covers. Homeground covers the 48 conterminous states and the District of Columbia, where the EPA maps its Level III ecoregions.',
    notOnLandField: 'is not on land in a US county: at sea, on a large lake or outside the United States',
    notOnLandZip:
      "That ZIP code's centre ({{lat}}, {{lon}}) is not on land in any US county: it is at sea, on one of the Great Lakes or outside the United States. Homeground covers the 48 conterminous states and the District of Columbia, where the EPA maps its Level III ecoregions.",
    notOnLandPoint:
      'That point ({{lat}}, {{lon}}) is not on land in any US county: it is at sea, on one of the Great Lakes or outside the United States. Homeground covers the 48 conterminous states and the District of Columbia, where the EPA maps its Level III ecoregions.',
    outside: {
      AK: 'Alaska',
      HI: 'Hawaii',
      PR: 'Puerto Rico',
      VI: 'The US Virgin Islands',
      GU: 'Guam',
      AS: 'American Samoa',
      MP: 'The Northern Mariana Islands',
    },
  },
  /** Refusals of the areas people meet first (403/404/409): one whole sentence each. */
  refusals: {
    savedMixes: {
      tooMany: 'You already keep {{max}} saved mixes: delete one you no longer need, then save this one.',
      noLink: 'No saved mix with that link: it may have been deleted.',
      noId: 'No saved mix with that id.',
      notYours: 'Only the person who saved a mix can delete it.',
    },
    catalogue: {
      ecoregionField: 'is not in the catalogue',
      ecoregion: 'region.ecoregionCode is not in the catalogue',
      slugField: '"{{slug}}" is not in the catalogue',
      slugs: 'Not in the catalogue: {{slugs}}',
    },
    groups: {
      noSlug: 'No group called "{{slug}}".',
      noId: 'No such group.',
      membersOnly: 'Only members of this group can see who is in it.',
      organiserAdds: 'Only an organiser of this group can add people to it.',
      noAccount: 'No account uses {{email}}: ask them to register first.',
      organiserRemoves: 'Only an organiser of this group can remove people from it.',
      notInGroup: 'That person is not in this group.',
      lastOrganiser: "This is the group's only organiser: make someone else an organiser first.",
    },
    seasons: {
      noEcoregion: 'This group has no ecoregion yet: set its place first.',
      seasonMembersOnly: 'Only people in this group can see its season.',
      planMembersOnly: 'Only people in this group can see its season plan.',
      organiserChanges: 'Only an organiser of this group can change its season plan.',
      noPlan: '{{group}} has no season plan yet: an organiser sets its dates first.',
    },
    batches: {
      formerGrower: 'A former grower',
      ownMethods: "Growers set their own methods and capacity, not someone else's.",
      notAGrower: 'That person is not a grower or organiser of this group.',
      noBatch: 'No such batch in this season.',
      anotherGrower: 'This batch belongs to another grower.',
      ownLog: 'Only the grower of this batch keeps its log.',
      organiserOnly: 'Only an organiser of this group can do this.',
      growersOnly: 'Batches are for the growers and organisers of this group.',
      capacityBelowUsed: 'must be at least {{taken}}: the batches already take {{taken}} {{unit}}',
      keepMethod: 'must keep {{method}}: batches use it',
      notThisSeason: 'is not a batch of this season',
      notOnTargets: '"{{slug}}" is not on the season\'s targets',
      notAGrowerField: 'is not a grower of this group',
      methodNotUsed: '{{name}} does not use this method',
      overCapacity: 'takes {{name}} to {{total}} {{unit}}, over the {{capacity}} they can tend',
      keepLogged: 'must keep every batch that has log entries (list it with its id)',
      /** The unit each method counts in, as the reasons above say it (always more than one). */
      units: { pot: 'pots', container: 'covered containers', block: 'soil blocks' },
    },
    invitations: {
      organiserInvites: 'Only an organiser of this group can invite people to it.',
      alreadyIn: '{{email}} is already in {{group}}: change their role in the member list instead.',
      organiserSees: 'Only an organiser of this group can see its invitations.',
    },
    species: {
      noSpecies: 'No species "{{slug}}" in the catalogue.',
      noPhoto: 'No photo for "{{slug}}" yet.',
      photoType: 'Photos must be JPEG, PNG or WebP; this file is {{mime}}.',
      photoUnknownType: 'Photos must be JPEG, PNG or WebP; this file is not an image we recognise.',
      photoUnreadable: 'The photo could not be read: the file may be damaged.',
      photoTooLarge:
        'The photo is {{width}} × {{height}} pixels; photos may have at most {{megapixels}} megapixels. Please make it smaller and try again.',
      existsEdit: 'Species "{{slug}}" already exists: edit it instead.',
      exists: 'Species "{{slug}}" already exists.',
      noChange: 'No change {{changeId}} in the history of "{{slug}}".',
      firstVersion: 'This change added the species: there is no earlier version to go back to.',
      clash: 'USDA symbol {{symbol}} or name {{name}} is already used by "{{slug}}".',
      unknownSource: '"{{source}}" is not in the sources registry',
      seeRows: 'see rows',
      fileProblems: 'The file has {{count}} problem(s); nothing was imported.',
      csvUnreadable: '{{reason}}',
      columnMissing: 'column missing from the header',
      noRows: 'the file has no species rows',
      repeatsLine: 'repeats line {{line}}',
      usedBy: 'is already used by "{{slug}}"',
    },
    ecoregions: {
      noRegion: 'No EPA Level III ecoregion "{{code}}".',
    },
    people: {
      noUser: 'No such user.',
      emailTaken: 'An account with this e-mail already exists: sign in instead.',
      noPerson: 'No such person.',
      ownRole: 'You cannot change your own role: ask another admin to do it.',
      ownAccess: 'You cannot switch off your own account.',
    },
    roles: {
      /** `roles`: the role codes in English, the role titles elsewhere, joined by `or`. */
      needs: 'This needs the {{roles}} role.',
      or: ' or ',
    },
    outbox: {
      readersOnly: 'Only organisers and admins can read the outbox.',
      noMessage: 'No message with that id in the outbox.',
      messageReaders: 'Only organisers of its group and admins can read this message.',
    },
  },
  auth: {
    wrongPassword: 'E-mail or password is wrong.',
    switchedOff: 'This account is switched off: ask a Homeground admin.',
    tooManyAttempts: 'Too many attempts: wait a minute and try again.',
    tooManyWrong_one: 'Too many wrong passwords for this e-mail address: wait {{count}} minute and try again.',
    tooManyWrong_other: 'Too many wrong passwords for this e-mail address: wait {{count}} minutes and try again.',
    passwordPersonal: 'must not contain your e-mail name, your name or "Homeground"',
    passwordWeak: 'is too easy to guess (a common password or a simple pattern): try three or four unrelated words',
    linkUnknown: 'This confirmation link was already used or is not one we sent: sign in, or sign up again.',
    linkOld: 'This confirmation link is more than {{hours}} hours old: sign up again.',
    alreadyHasAccount: 'This address already has an account: sign in instead.',
    confirmMail: {
      thanks:
        'Thank you for joining Homeground. Open the link below to confirm this is your address, and your account is ready.',
      hours:
        'The link works for {{hours}} hours. If you did not sign up, you can simply ignore this message: no account is made.',
      action: 'Confirm my address',
      subject: 'Confirm your address for Homeground',
    },
    alreadyMail: {
      someone:
        'Someone asked to make a Homeground account with this address, but you already have one, so nothing has changed.',
      ifYou:
        'If it was you, sign in with your password. If it was not, you can ignore this message: your account is as it was.',
      action: 'Sign in',
      subject: 'You already have a Homeground account',
    },
    mailFooter: 'You got this e-mail because someone entered your address on the Homeground sign-up page.',
  },
  share: {
    /** General words under a plant share's list of plants: the usual cautions, and local rules first. */
    notes: {
      cautions:
        'Cautions are shown with each plant, as on its fact card: wear gloves for plants with irritating sap and wash your hands after handling them.',
      dig: 'Before you dig, call 811 so buried lines are marked; your town’s rules for planting by streets, sidewalks and drains come first.',
    },
  },
  mail: {
    openAddress: 'Or open this address: {{url}}',
    greeting: 'Hello {{name}},',
    greetingNoName: 'Hello,',
    reservation: {
      reserved: 'Your plants from the {{group}} plant share are reserved.',
      changed: 'Your reservation at the {{group}} plant share has been changed.',
      slot: 'Pickup slot: {{when}}.',
      place: 'Place: {{place}}.',
      bring: 'What to bring: {{what}}',
      plants: 'Your plants: {{plants}}.',
      care: 'Care sheet:',
      dig: 'Before you dig, call 811 so buried lines are marked, and follow your town’s rules for planting by streets and sidewalks.',
      link: 'To change your slot or plants, or to cancel so someone on the waitlist gets them, use your private link below. Keep it to yourself: anyone with it can change your reservation.',
      action: 'Change or cancel your reservation',
      footer:
        "You got this e-mail because you reserved plants from {{group}} on Homeground. Your name and e-mail are seen only by the group's organisers and are deleted after the share.",
      subjectChanged: 'Your reservation at the {{group}} plant share has changed',
      subjectReserved: 'Your plants are reserved: {{group}} plant share, {{when}}',
    },
    shareChanged: {
      intro: 'The organisers of the {{group}} plant share have changed something about your pickup.',
      day: 'The plant share is now on {{now}} (it was {{before}}).',
      place: 'The place is now {{now}} (it was {{before}}).',
      slot: 'Your pickup slot is now {{now}} (it was {{before}}).',
      still: 'Your plants are still reserved: {{plants}}.',
      link: 'If the new time or place does not suit you, change your slot or cancel with your private link below, so someone on the waitlist gets the plants. This link replaces the one in your earlier e-mails.',
      action: 'Change or cancel your reservation',
      subject: 'A change to your pickup: {{group}} plant share',
    },
    offer: {
      free_one:
        'Good news: {{count}} × {{plant}} came free at the {{group}} plant share, and we are holding it for you because you were next on the waitlist.',
      free_other:
        'Good news: {{count}} × {{plant}} came free at the {{group}} plant share, and we are holding them for you because you were next on the waitlist.',
      choose:
        'Open your private link to choose a pickup slot at {{place}}. We hold them for you until {{until}}; after that they go to the next household on the list. If you no longer want them, simply ignore this e-mail.',
      action: 'Choose your pickup slot',
      footer:
        "You got this e-mail because you joined the waitlist of {{group}}'s plant share. Your name and e-mail are deleted after the share.",
      subject: '{{plant}} is free for you: {{group}} plant share',
    },
    invitation: {
      invited: '{{inviter}} has invited you to join {{group}} in {{town}}, {{state}} on Homeground, as {{role}}.',
      role: { member: 'a member', grower: 'a grower', organiser: 'an organiser' },
      what: {
        member: 'Members hear when the plant share opens and can reserve plants for their yard.',
        grower:
          'Growers raise a batch of native plants over the winter for the plant share. Homeground gives you the dates for each step and a place to log what comes up; no experience needed.',
        organiser: 'Organisers choose the species for the season, hand out batches to growers and run the plant share.',
      },
      days: 'The link below works for {{days}} days. If you did not expect this message, you can simply ignore it.',
      action: 'Join {{group}}',
      footer:
        'You got this e-mail because an organiser of {{group}} entered your address. Homeground sends you nothing more unless you join.',
      subject: '{{inviter}} invites you to {{group}}',
    },
  },
} as const;
